import path from 'node:path';

/**
 * Every setting the app reads from the environment, with its embedded default, so that a fresh
 * clone runs with no env file and no keys. Read at call time (not at build time) so the built
 * server picks up the environment it is started with.
 */
export interface AppConfig {
  host: string;
  port: number;
  dataDir: string;
  databaseFile: string;
  /** Public origin used in links inside e-mails and reports. */
  publicUrl: string;
  production: boolean;
}

function intFromEnv(name: string, fallback: number): number {
  const raw = process.env[name];
  if (raw === undefined || raw === '') return fallback;
  const value = Number.parseInt(raw, 10);
  return Number.isFinite(value) ? value : fallback;
}

/** Current configuration from process.env. */
export function getConfig(): AppConfig {
  const host = process.env.HOST || '127.0.0.1';
  const port = intFromEnv('PORT', 4321);
  const dataDir = path.resolve(process.env.DATA_DIR || 'data');
  return {
    host,
    port,
    dataDir,
    databaseFile: path.join(dataDir, 'drainwright.sqlite'),
    publicUrl: process.env.PUBLIC_URL || `http://${host === '0.0.0.0' ? 'localhost' : host}:${port}`,
    production: process.env.NODE_ENV === 'production',
  };
}

/** Read an integer setting, falling back to a default when unset or malformed. */
export { intFromEnv };
