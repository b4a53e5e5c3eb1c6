import { Router } from 'express';
import {
  createListingInput,
  hideListingInput,
  listingIdParams,
  listListingsQuery,
  sendMessageInput,
  threadIdParams,
  updateListingInput,
} from '@shared/schemas/listing.ts';
import type { Config } from '../config.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { limiter } from '../middleware/rate-limit.ts';
import { createListing, getListing, hideListing, listListings, listMyListings, updateListing } from '../services/listing.service.ts';
import { getThread, listThreads, replyInThread, sendListingMessage } from '../services/message.service.ts';
import { photoRoutesFor } from './attached-photo.routes.ts';

/** The exchange: listings, messages to their owners, and each maker's inbox. */
export function exchangeRoutes(config: Config): Router {
  const r = Router();
  const listing = validate(listingIdParams, 'params');
  const thread = validate(threadIdParams, 'params');
  const messageLimit = limiter(config.rateLimits, { windowMs: 10 * 60_000, limit: 20, what: 'messages', perUser: true });
  r.get('/api/listings', validate(listListingsQuery, 'query'), async (req, res) => {
    res.json(await listListings(actorOf(req), res.locals.query));
  });
  r.get('/api/listings/mine', requireUser, async (req, res) => {
    res.json(await listMyListings(actorOf(req)));
  });
  r.post('/api/listings', requireUser, validate(createListingInput), async (req, res) => {
    res.status(201).json(await createListing(actorOf(req), res.locals.body));
  });
  r.get('/api/listings/:listingId', listing, async (req, res) => {
    res.json(await getListing(actorOf(req), res.locals.params.listingId));
  });
  r.patch('/api/listings/:listingId', requireUser, listing, validate(updateListingInput), async (req, res) => {
    res.json(await updateListing(actorOf(req), res.locals.params.listingId, res.locals.body));
  });
  r.post('/api/listings/:listingId/visibility', requireUser, listing, validate(hideListingInput), async (req, res) => {
    res.json(await hideListing(actorOf(req), res.locals.params.listingId, res.locals.body));
  });
  r.post('/api/listings/:listingId/messages', requireUser, messageLimit, listing, validate(sendMessageInput), async (req, res) => {
    res.status(201).json(await sendListingMessage(actorOf(req), res.locals.params.listingId, res.locals.body));
  });
  r.get('/api/inbox', requireUser, async (req, res) => {
    res.json({ threads: await listThreads(actorOf(req)) });
  });
  r.get('/api/inbox/:threadId', requireUser, thread, async (req, res) => {
    res.json(await getThread(actorOf(req), res.locals.params.threadId));
  });
  r.post('/api/inbox/:threadId/messages', requireUser, messageLimit, thread, validate(sendMessageInput), async (req, res) => {
    res.status(201).json(await replyInThread(actorOf(req), res.locals.params.threadId, res.locals.body));
  });
  r.use(photoRoutesFor('listing', config.uploadsDir));
  return r;
}
