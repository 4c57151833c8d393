// Request limits shared by the route wrapper (lib/auth/authorize.ts → ./body.ts), the proxy's
// checks of server-action posts (./action-guard.ts) and next.config.mjs (serverActions.bodySizeLimit),
// so a document the board can save or size is one the API takes too. Plain JS so next.config.mjs
// can import it without a TypeScript loader.

/** Largest request body, in bytes, for every route handler and server action. */
export const BODY_LIMIT_BYTES = 2 * 1024 * 1024;

/**
 * Deepest nesting of JSON arrays and objects a body may have. A schematic needs about 6
 * (document → parts → part → props → curve → point); 64 leaves room and still refuses the
 * thousands of levels that overflow recursive code (common practice, our own margin).
 */
export const JSON_MAX_DEPTH = 64;

/** "2 MB" for messages. */
export const BODY_LIMIT_TEXT = `${BODY_LIMIT_BYTES / (1024 * 1024)} MB`;
