import { ZodError } from "zod";

// Error → HTTP answer mapping shared by route handlers (apiHandler) and server actions
// (runAction). AuthError carries its own status; ZodError is 400 with field issues;
// anything else is a logged 500 whose message never reaches the caller.

export class AuthError extends Error {
  readonly status: 401 | 403 | 404;
  constructor(status: 401 | 403 | 404, message: string) {
    super(message);
    this.name = "AuthError";
    this.status = status;
  }
}

/** A known, safe-to-show failure of user input or state (wrong token, taken e-mail, rate limit). */
export class UserError extends Error {
  readonly status: number;
  readonly headers?: Record<string, string>;
  constructor(status: number, message: string, headers?: Record<string, string>) {
    super(message);
    this.name = "UserError";
    this.status = status;
    this.headers = headers;
  }
}

export type Issue = { path: string; message: string };
export type ErrorBody = { status: number; error: string; issues?: Issue[]; headers?: Record<string, string> };

export function zodIssues(err: ZodError): Issue[] {
  return err.issues.map((i) => ({ path: i.path.map(String).join(".") || "(input)", message: i.message }));
}

export function errorBody(err: unknown): ErrorBody {
  if (err instanceof AuthError) return { status: err.status, error: err.message };
  if (err instanceof UserError) return { status: err.status, error: err.message, headers: err.headers };
  if (err instanceof ZodError) {
    const issues = zodIssues(err);
    const first = issues[0];
    return { status: 400, error: first ? `${first.path}: ${first.message}` : "The input is not valid.", issues };
  }
  if (err instanceof SyntaxError && /JSON/i.test(err.message)) return { status: 400, error: "The request body is not valid JSON." };
  console.error("[loopwright] unexpected error", err);
  return { status: 500, error: "Something went wrong on our side. It has been logged; please try again." };
}
