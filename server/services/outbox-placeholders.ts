/** Placeholder for the app's public address in queued mail; the outbox worker fills it in at send time. */
export const APP_URL = '{{APP_URL}}';
