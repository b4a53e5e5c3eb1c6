import { Agent } from 'node:http';

/** How long an unused connection is kept: below Node's default server keepAliveTimeout (5 s), which the app keeps. */
const IDLE_MS = 2000;

/**
 * Keep-alive connections as a browser uses them, so a connection the server cuts mid-request shows up as a failure.
 * An idle connection is dropped after 2 s: the server closes its end at 5 s, and a request sent on a connection the
 * server is closing at that moment fails with ECONNRESET. Browsers send such a request again on a new connection;
 * Node 20's agent neither does that nor honours the server's `Keep-Alive: timeout=5` hint, so it would report a fault
 * the product does not have.
 */
export function keepAliveAgent(maxSockets: number): Agent {
  return new Agent({ keepAlive: true, maxSockets, timeout: IDLE_MS });
}
