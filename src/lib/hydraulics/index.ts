/**
 * The hydraulics engine's public surface: pure TypeScript, SI units inside. Islands and endpoints
 * import from here.
 */
export * from './constants';
export * from './types';
export * from './water';
export * from './atmosphere';
export * from './fluid';
export * from './friction';
export * from './line';
export * from './siphon';
export * from './inverse';
export * from './warnings';
export { brentRoot } from './roots';

// Written by other engineers.
export * from './catalog';
export * from './units';
export * from './vessels';
export * from './drain';
export * from './drain-sizing';
