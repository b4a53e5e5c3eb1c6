// Types of throwaway-mariadb.mjs for the TypeScript tests and benchmarks.
export interface ThrowawayMariaDb {
  /** Data directory root (data/, tmp/, mysqld.sock, error.log). */
  dir: string;
  port: number;
  socket: string;
  /** The server's own TMPDIR, inside `dir`. */
  tmp: string;
  /** Where to connect: the database and user made at start (`name` is set only when `database` was given). */
  db: { host: string; port: number; name: string; user: string; password: string };
  /** Start mariadbd again on the same data directory and port (nothing when it runs). */
  start(): Promise<void>;
  /** SIGTERM mariadbd and wait until it has exited. */
  stop(): Promise<void>;
  running(): boolean;
  /** SQL as root over the socket; returns mariadb's tab-separated output. */
  sql(statement: string): string;
  /** Stop the server and delete its directory. */
  destroy(): Promise<void>;
}

export function startThrowawayMariaDb(options?: {
  port?: number;
  database?: string;
  user?: string;
  password?: string;
  fast?: boolean;
  label?: string;
}): Promise<ThrowawayMariaDb>;
