/**
 * API v1 answers and requests as plain data, free of any server framework. The same route code
 * then runs behind Astro (development, tests) and on the production server's short path, where
 * building web-standard Request/Response objects cost far more than the calculation itself.
 */

/** An answer: status, headers, and a body serialised as JSON (none for 204 and HEAD-only use). */
export interface ApiAnswer {
  status: number;
  headers: Record<string, string>;
  body?: unknown;
}

/** The request body's bytes, or why they could not be read. */
export type BodyBytes =
  { ok: true; bytes: Uint8Array } | { ok: false; reason: 'too_large' | 'unreadable' | 'late' };

/** What a route reads of a request. Header names are lower-case. */
export interface ApiRequest {
  method: string;
  url: URL;
  header(name: string): string | null;
  /**
   * The body, refused once it passes limitBytes or is still arriving after deadlineMs. The
   * server's short path may have read it already, with the same cap and deadline, and then
   * returns it at once.
   */
  readBody(limitBytes: number, deadlineMs: number): BodyBytes | Promise<BodyBytes>;
  clientAddress: string;
  requestId: string;
}

/** A route handler over plain data. */
export type ApiOperation = (request: ApiRequest) => ApiAnswer | Promise<ApiAnswer>;

/** A JSON answer. */
export function jsonAnswer(
  status: number,
  body: unknown,
  headers: Record<string, string> = {},
): ApiAnswer {
  return { status, body, headers: { 'Content-Type': 'application/json', ...headers } };
}

/** The answer as a web Response (for Astro routes). */
export function toResponse(answer: ApiAnswer): Response {
  const body = answer.body === undefined ? null : JSON.stringify(answer.body);
  return new Response(body, { status: answer.status, headers: answer.headers });
}
