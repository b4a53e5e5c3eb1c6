import type { Request } from 'express';
import type { Actor } from '@shared/policies.ts';
import type { User } from '../models/user.model.ts';
import { toActor } from '../services/user.service.ts';

/** The signed-in user as the policy module sees them, or null for a visitor. */
export function actorOf(req: Request): Actor | null {
  const user = req.user as User | undefined;
  return user ? toActor(user) : null;
}
