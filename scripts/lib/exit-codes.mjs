// What `npm start` exits with, so a wrapper (systemd, a shell script) can tell what happened.
// The app's own non-zero code is passed through when it fails on its own before it ever listened
// (a bad setting, say): restarting would only fail again. README "Operating it" lists these.
export const EXIT = {
  /** Stopped by SIGINT/SIGTERM and everything shut down cleanly (or the app stopped itself with 0). */
  OK: 0,
  /** MariaDB would not start (the first start of this run). */
  MARIADB_WOULD_NOT_START: 69,
  /** Installing, building, migrating or seeding failed before the app was started. */
  PREPARE_FAILED: 70,
  /** The app or MariaDB kept dying: gave up after too many restarts in a row. */
  GAVE_UP: 71,
  /** Another `npm start` is running from this data directory (its pid is printed). */
  ALREADY_RUNNING: 72,
  /** `npm run serve`: a required setting is missing (GitHub, mail relay, database password). */
  CONFIG_MISSING: 78,
  /** A second Ctrl-C / SIGTERM while stopping: everything was killed at once. */
  FORCED: 130,
};
