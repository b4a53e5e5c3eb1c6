import { createHash } from 'node:crypto';

/** Demo accounts of our invented community; the stand-in's sign-in page offers them. */
export const DEMO_ACCOUNTS = [
  { login: 'demo-maker', name: 'Demo Maker', role: 'maker' },
  { login: 'demo-moderator', name: 'Demo Moderator', role: 'moderator' },
  { login: 'demo-admin', name: 'Demo Admin', role: 'admin' },
  { login: 'marit-builds', name: 'Marit', role: 'maker' },
  { login: 'tunnel-rohan', name: 'Rohan', role: 'maker' },
  { login: 'bimorph-bea', name: 'Bea', role: 'maker' },
  { login: 'stage-kwame', name: 'Kwame', role: 'maker' },
  // A second moderator, so that a moderator's own work (four eyes) still has someone to decide it.
  { login: 'flexure-ines', name: 'Ines', role: 'moderator' },
] as const;

/** The stand-in's stable numeric id for a handle (same handle, same account, every run). */
export function standInGithubId(login: string): string {
  return String(parseInt(createHash('sha256').update(login.toLowerCase()).digest('hex').slice(0, 10), 16));
}

export const standInEmail = (login: string) => `${login.toLowerCase()}@makers.scanwright.local`;
