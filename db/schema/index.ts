export * from './users';
export * from './organisations';
export * from './jobs';
export * from './flags';
export * from './brands';
export * from './billing';
export * from './invitations';
