// Where the project keeps its runtime state, and the secrets it generates once.
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync, readdirSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';

export const ROOT = process.cwd();
/** Runtime state of `npm start`; SCANWRIGHT_DATA_DIR moves it (tests use their own). */
export const DATA_DIR = process.env.SCANWRIGHT_DATA_DIR ? resolve(process.env.SCANWRIGHT_DATA_DIR) : join(ROOT, '.data');

/** Secrets made on the first start and kept in .data/secrets.json (git-ignored). */
export function localSecrets() {
  mkdirSync(DATA_DIR, { recursive: true });
  const file = join(DATA_DIR, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8'));
  const secrets = { dbPassword: randomBytes(18).toString('base64url'), sessionSecret: randomBytes(32).toString('base64url') };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}

function newestMtime(path) {
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  let newest = 0;
  for (const name of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, name)));
  return newest;
}

/** True when dist/client is missing or older than any client source. */
export function clientBuildIsStale() {
  const built = join(ROOT, 'dist/client/index.html');
  if (!existsSync(built)) return true;
  const sources = ['src', 'shared', 'index.html', 'vite.config.ts', 'package-lock.json'].filter((p) => existsSync(p));
  return Math.max(...sources.map(newestMtime)) > statSync(built).mtimeMs;
}

/** True when dist/server is missing or older than any server or shared source. */
export function serverBuildIsStale() {
  const built = join(ROOT, 'dist/server/index.mjs');
  if (!existsSync(built)) return true;
  const sources = ['server', 'shared', 'package-lock.json', 'tsconfig.json'].filter((p) => existsSync(p));
  return Math.max(...sources.map(newestMtime)) > statSync(built).mtimeMs;
}
