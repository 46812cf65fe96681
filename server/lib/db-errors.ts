/**
 * What a MariaDB error means for the request, in one place. Drizzle wraps the driver's error in
 * a DrizzleQueryError whose `cause` is mysql2's error, so every test walks the cause chain.
 */
interface DriverError {
  code?: unknown;
  errno?: unknown;
  cause?: unknown;
}

function* causes(error: unknown): Generator<DriverError> {
  let current: unknown = error;
  for (let depth = 0; depth < 5 && current && typeof current === 'object'; depth++) {
    yield current as DriverError;
    current = (current as DriverError).cause;
  }
}

function matches(error: unknown, codes: ReadonlySet<string>, errnos: ReadonlySet<number>) {
  for (const e of causes(error)) {
    if (typeof e.code === 'string' && codes.has(e.code)) return true;
    if (typeof e.errno === 'number' && errnos.has(e.errno)) return true;
  }
  return false;
}

/** A unique index refused the row (1062). */
export function isDuplicateKey(error: unknown) {
  return matches(error, new Set(['ER_DUP_ENTRY']), new Set([1062]));
}

/**
 * The transaction lost a lock race and may simply be run again: a deadlock (1213, also what a
 * Galera cluster answers when a write set fails certification) or a lock-wait timeout (1205).
 */
export function isRetryableTransactionError(error: unknown) {
  return matches(error, new Set(['ER_LOCK_DEADLOCK', 'ER_LOCK_WAIT_TIMEOUT']), new Set([1213, 1205]));
}

const connectionCodes = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  'EHOSTUNREACH',
  'ENETUNREACH',
  'PROTOCOL_CONNECTION_LOST',
  'PROTOCOL_SEQUENCE_TIMEOUT',
  'PROTOCOL_ENQUEUE_AFTER_FATAL_ERROR',
  'PROTOCOL_ENQUEUE_AFTER_QUIT',
  'ER_CON_COUNT_ERROR',
  'ER_SERVER_SHUTDOWN',
  'ER_UNKNOWN_COM_ERROR',
]);
// 1040 too many connections, 1047 WSREP has not yet prepared node (a Galera node out of the
// cluster), 1053 server shutdown in progress, 1927 connection killed, 2002/2003/2006/2013 connection gone.
const connectionErrnos = new Set([1040, 1047, 1053, 1927, 2002, 2003, 2006, 2013]);

/** MariaDB cannot be reached or is not serving: the request may succeed later (503). */
export function isDatabaseUnavailable(error: unknown) {
  if (matches(error, connectionCodes, connectionErrnos)) return true;
  // mysql2's pool says these in words only.
  for (const e of causes(error)) {
    const message = (e as { message?: unknown }).message;
    if (typeof message === 'string' && /^(Queue limit reached|Pool is closed|Can't add new command when connection is in closed state)/.test(message)) return true;
  }
  return false;
}

/** A short description for the log line: code and errno of the innermost driver error. */
export function describeDbError(error: unknown) {
  let last: DriverError | undefined;
  let innermost: unknown = error;
  for (const e of causes(error)) {
    innermost = e;
    if (e.code !== undefined || e.errno !== undefined) last = e;
  }
  if (last) return [last.code, last.errno].filter((x) => x !== undefined).join(' ');
  // No driver code (a rollback on a connection already gone, say): the innermost message, on one line.
  return String((innermost as Error)?.message ?? innermost).split('\n')[0].trim() || 'no detail';
}
