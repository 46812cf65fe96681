/**
 * Errors that mean "the database cannot answer right now", not "this request is wrong": a lost
 * or refused connection, a server shutting down, a Galera node that has left the cluster's
 * primary component. The error middleware answers them with 503 so a client retries, never 500.
 */
const connectionCodes = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'PROTOCOL_CONNECTION_LOST', 'PROTOCOL_SEQUENCE_TIMEOUT', 'ER_CON_COUNT_ERROR']);

/**
 * MariaDB error numbers: 1047 WSREP not ready (ER_UNKNOWN_COM_ERROR), 1053 server shutdown, 1927
 * connection killed, 2002/2003/2006/2013 connection gone; 1205 lock wait timeout and 1213 deadlock
 * (also Galera's certification failure) once the transaction retry in server/db has given up.
 */
const unavailableErrnos = new Set([1047, 1053, 1205, 1213, 1927, 2002, 2003, 2006, 2013]);

export function isDatabaseUnavailable(error: unknown): boolean {
  for (let e = error as { code?: unknown; errno?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 4; e = e.cause as typeof e, depth++) {
    if (typeof e.code === 'string' && connectionCodes.has(e.code)) return true;
    if (typeof e.errno === 'number' && unavailableErrnos.has(e.errno)) return true;
  }
  return false;
}
