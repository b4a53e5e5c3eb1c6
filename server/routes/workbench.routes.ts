import { Router } from 'express';

export function workbenchRoutes(): Router {
  const r = Router();
  return r;
}
