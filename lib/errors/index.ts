// Errors the domain areas throw: what went wrong, in words a person can act on, and which kind of
// failure it is. The HTTP layer (lib/api) maps each kind to a status; pages map them to their
// not-found and forbidden screens. No area below lib/api knows about HTTP.
export const ERROR_STATUS = {
  invalid: 400,
  unauthenticated: 401,
  forbidden: 403,
  "not-found": 404,
  conflict: 409,
  gone: 410,
  "too-large": 413,
  unsupported: 415,
  "too-many": 429,
  upstream: 502,
  unavailable: 503,
} as const;

export type ErrorKind = keyof typeof ERROR_STATUS;

export class DomainError extends Error {
  constructor(
    readonly kind: ErrorKind,
    message: string,
    readonly fieldErrors?: Record<string, string[]>,
    /** extra figures the answer carries beside the message (a seat refusal's seats and billing link) */
    readonly details?: Record<string, string | number | Record<string, string | number>>,
  ) {
    super(message);
  }

  /** For the few places that pass on a status another service gave (the auth plugin, uploads). */
  static fromStatus(status: number, message: string, fieldErrors?: Record<string, string[]>): DomainError {
    const kind = (Object.entries(ERROR_STATUS).find(([, s]) => s === status)?.[0] ?? (status >= 500 ? "upstream" : "invalid")) as ErrorKind;
    return new DomainError(kind, message, fieldErrors);
  }

  get status(): number {
    return ERROR_STATUS[this.kind];
  }
}
