import { Router } from 'express';
import type { Config } from '../config.ts';

/** Photo uploads and upkeep for builds (being built). */
export function photoRoutes(_config: Config): Router {
  return Router();
}
