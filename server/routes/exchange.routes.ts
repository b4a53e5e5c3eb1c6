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
import type { PhotoStore } from '../storage/photo-store.ts';
import { requireUser } from '../middleware/auth.ts';
import { limiter } from '../middleware/rate-limit.ts';
import { createListing, getListing, hideListing, listListings, listMyListings, updateListing } from '../services/listing.service.ts';
import { getThread, listThreads, markThreadRead, replyInThread, sendListingMessage } from '../services/message.service.ts';
import { photoRoutesFor } from './attached-photo.routes.ts';
import { route } from './route.ts';

/** The exchange: listings, messages to their owners, and each maker's inbox. */
export function exchangeRoutes(config: Config, photos: PhotoStore): Router {
  const r = Router();
  const messageLimit = limiter(config, { windowMs: 10 * 60_000, limit: 20, what: 'messages', perUser: true });
  r.get(
    '/api/listings',
    route({ query: listListingsQuery }, async ({ actor, query, res }) => {
      res.json(await listListings(actor, query));
    }),
  );
  r.get(
    '/api/listings/mine',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json(await listMyListings(actor));
    }),
  );
  r.post(
    '/api/listings',
    requireUser,
    route({ body: createListingInput }, async ({ actor, body, res }) => {
      res.status(201).json(await createListing(actor, body));
    }),
  );
  r.get(
    '/api/listings/:listingId',
    route({ params: listingIdParams }, async ({ actor, params, res }) => {
      res.json(await getListing(actor, params.listingId));
    }),
  );
  r.patch(
    '/api/listings/:listingId',
    requireUser,
    route({ params: listingIdParams, body: updateListingInput }, async ({ actor, params, body, res }) => {
      res.json(await updateListing(actor, params.listingId, body));
    }),
  );
  r.post(
    '/api/listings/:listingId/visibility',
    requireUser,
    route({ params: listingIdParams, body: hideListingInput }, async ({ actor, params, body, res }) => {
      res.json(await hideListing(actor, params.listingId, body));
    }),
  );
  r.post(
    '/api/listings/:listingId/messages',
    requireUser,
    messageLimit,
    route({ params: listingIdParams, body: sendMessageInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await sendListingMessage(actor, params.listingId, body));
    }),
  );
  r.get(
    '/api/inbox',
    requireUser,
    route({}, async ({ actor, res }) => {
      res.json({ threads: await listThreads(actor) });
    }),
  );
  r.get(
    '/api/inbox/:threadId',
    requireUser,
    route({ params: threadIdParams }, async ({ actor, params, res }) => {
      res.json(await getThread(actor, params.threadId));
    }),
  );
  r.post(
    '/api/inbox/:threadId/read',
    requireUser,
    route({ params: threadIdParams }, async ({ actor, params, res }) => {
      await markThreadRead(actor, params.threadId);
      res.status(204).end();
    }),
  );
  r.post(
    '/api/inbox/:threadId/messages',
    requireUser,
    messageLimit,
    route({ params: threadIdParams, body: sendMessageInput }, async ({ actor, params, body, res }) => {
      res.status(201).json(await replyInThread(actor, params.threadId, body));
    }),
  );
  r.use(photoRoutesFor('listing', photos));
  return r;
}
