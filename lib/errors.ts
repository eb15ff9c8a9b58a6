/** Error codes that mean "the database cannot be reached right now" rather than a bug. */
const UNAVAILABLE_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ETIMEDOUT",
  "EPIPE",
  "ENOTFOUND",
  "PROTOCOL_CONNECTION_LOST",
  "ER_CON_COUNT_ERROR",
  "ER_SERVER_SHUTDOWN",
  // A server shutting down kills the connections and statements it still has.
  "ER_CONNECTION_KILLED",
  "ER_QUERY_INTERRUPTED",
  "ER_ACCESS_DENIED_ERROR",
]);

/** Whether the error or one of its causes (Drizzle wraps the driver's error) matches. */
type Cause = { code?: unknown; errno?: unknown; fatal?: unknown };
function someCause(error: unknown, test: (e: Cause) => boolean): boolean {
  let e: unknown = error;
  for (let depth = 0; e && depth < 5; depth++) {
    if (test(e as Cause)) return true;
    if (e instanceof AggregateError && e.errors.some((inner) => someCause(inner, test))) return true;
    e = (e as { cause?: unknown }).cause;
  }
  return false;
}

/**
 * True for errors that mean "the database cannot be reached right now": the codes above, and any
 * error mysql2 marks `fatal` — the connection is gone (e.g. the ROLLBACK a failed transaction
 * sends on a connection the server closed: "Can't add new command when connection is in closed
 * state", which carries no code).
 */
export function isDatabaseUnavailable(error: unknown): boolean {
  return someCause(error, ({ code, fatal }) => fatal === true || (typeof code === "string" && UNAVAILABLE_CODES.has(code)));
}

/**
 * MariaDB error numbers for a value it will not store: too long (1406), out of range (1264, 1690),
 * not valid text or a bad date (1366, 1292), truncated (1265), a CHECK such as JSON_VALID (4025).
 * Input the schemas let through by mistake: the request's fault, never a 500.
 */
const VALUE_REFUSED_ERRNOS = new Set([1264, 1265, 1292, 1366, 1406, 1690, 4025]);

export function isValueRefusedByDatabase(error: unknown): boolean {
  return someCause(error, ({ errno }) => typeof errno === "number" && VALUE_REFUSED_ERRNOS.has(errno));
}

export const VALUE_REFUSED_MESSAGE = "A value in the request is too long or out of range to be stored.";

export const DATABASE_UNAVAILABLE_MESSAGE =
  "The database is not reachable right now. Please try again in a moment.";

/** A request that is well-formed but clashes with the record's state (answered 409). */
export class ConflictError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "ConflictError";
  }
}

/** Input that is well-formed but breaks a rule of one field (answered 400 with that field's message). */
export class FieldError extends Error {
  constructor(
    public readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = "FieldError";
  }
}

/** The record may not be used right now — e.g. booking a tagged-out press (answered 423 with the reason). */
export class LockedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "LockedError";
  }
}

/** The database kept timing out on locks after our retries (answered 503; the client may try again). */
export class BusyError extends Error {
  constructor() {
    super("The shop's records are busy right now. Please try again in a moment.");
    this.name = "BusyError";
  }
}
