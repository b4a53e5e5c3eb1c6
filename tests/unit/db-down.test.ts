// Which errors mean "the database is not reachable" (503 db_unavailable) rather than a fault of ours (500).
import { describe, expect, test } from 'vitest';
import { isDbDown } from '../../server/middleware/error-handler.ts';

// Shapes as Sequelize wraps the mariadb driver's SqlError (`original`/`parent` carry code, errno and sqlState);
// codes and numbers from the MariaDB Server error codes reference [S: mariadb.com/kb, "MariaDB Error Codes"].
const wrapped = (code: string, errno: number, sqlState: string) => ({
  name: 'SequelizeDatabaseError',
  original: { code, errno, sqlState },
});

describe('isDbDown', () => {
  test.each([
    ['a refused connection', wrapped('ECONNREFUSED', 0, '')],
    ['a server shutting down', wrapped('ER_SERVER_SHUTDOWN', 1053, '08S01')],
    ['a statement killed at shutdown', wrapped('ER_CONNECTION_KILLED', 1927, '70100')],
    ['a query interrupted at shutdown', wrapped('ER_QUERY_INTERRUPTED', 1317, '70100')],
    ['a socket closed under a query', wrapped('ER_SOCKET_UNEXPECTED_CLOSE', 45007, '08S01')],
    // Galera's 1047 "WSREP has not yet prepared node for application use" (once the write retries give up) is class 08.
    ['a Galera node outside the primary component', wrapped('ER_UNKNOWN_COM_ERROR', 1047, '08S01')],
    // Any error the driver marks fatal has ended its connection (mariadb connector's `fatal` flag).
    [
      'a fatal driver error of another code',
      { name: 'SequelizeDatabaseError', original: { code: 'ER_UNKNOWN_ERROR', errno: 1105, sqlState: 'HY000', fatal: true } },
    ],
  ])('when %s, then the database is down (503)', (_what, err) => {
    expect(isDbDown(err)).toBe(true);
  });

  test.each([
    ['a duplicate key', wrapped('ER_DUP_ENTRY', 1062, '23000')],
    [
      'a non-fatal error of that code',
      { name: 'SequelizeDatabaseError', original: { code: 'ER_UNKNOWN_ERROR', errno: 1105, sqlState: 'HY000', fatal: false } },
    ],
    ['a syntax error', wrapped('ER_PARSE_ERROR', 1064, '42000')],
    ['a plain error', new Error('boom')],
  ])('when %s, then it is not a database outage', (_what, err) => {
    expect(isDbDown(err)).toBe(false);
  });
});
