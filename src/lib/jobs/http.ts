import type { z } from 'zod';
import { logger } from '../server/logger';

/** An endpoint answer that ends the request early. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly body: Record<string, unknown>,
  ) {
    super(String(body.error));
  }
}

export interface Issue {
  path: string;
  message: string;
}

export function invalid(issues: Issue[]): HttpError {
  return new HttpError(400, { error: 'invalid_input', issues });
}

export function notFound(what = 'job'): HttpError {
  return new HttpError(404, { error: 'not_found', message: `No such ${what}.` });
}

/** The 409 body of an edit made on an older revision: the job as it now is, to compare or reload. */
export function staleEdit(current: { revision: number }): Record<string, unknown> {
  return {
    error: 'edit_conflict',
    message:
      'Someone saved this job after you opened it, so your changes were not saved. Reload to see theirs, or save yours over them.',
    job: current,
  };
}

/** zod issues as the API's { path, message } list. */
export function zodIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => ({
    path: i.path.map(String).join('.') || '(body)',
    message: i.message,
  }));
}

/** Parse a value with a zod schema or throw a 400 naming each bad field. */
export function parseWith<T>(schema: z.ZodType<T>, value: unknown): T {
  const r = schema.safeParse(value);
  if (!r.success) throw invalid(zodIssues(r.error));
  return r.data;
}

const MAX_BODY = 256 * 1024;

/** The request body as JSON: 415 when not JSON, 413 when too big, 400 when malformed. */
export async function jsonBody(request: Request): Promise<unknown> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/json\b/i.test(type)) {
    throw new HttpError(415, { error: 'unsupported_media_type', message: 'Send JSON.' });
  }
  // A read fails when the server's body cap cuts a chunked upload short (src/lib/server/body-limit.ts).
  const text = await request.text().catch(() => {
    throw new HttpError(413, { error: 'too_large', message: 'Body over 256 KiB.' });
  });
  if (text.length > MAX_BODY)
    throw new HttpError(413, { error: 'too_large', message: 'Body over 256 KiB.' });
  try {
    return JSON.parse(text);
  } catch {
    throw invalid([{ path: '(body)', message: 'is not valid JSON' }]);
  }
}

/** Run an endpoint body; HttpErrors become their JSON answer, anything else a plain 500 message. */
export async function handle(run: () => Promise<Response> | Response): Promise<Response> {
  try {
    return await run();
  } catch (e) {
    if (e instanceof HttpError) return Response.json(e.body, { status: e.status });
    logger.error({ err: e }, 'jobs endpoint failed');
    return Response.json(
      { error: 'server_error', message: 'Something went wrong; try again.' },
      { status: 500 },
    );
  }
}
