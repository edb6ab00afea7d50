/**
 * Calling an API v1 route handler directly, as Astro would: a Request, its URL, the client
 * address and the locals the middleware fills in.
 */
import type { APIContext, APIRoute } from 'astro';

export interface CallOptions {
  method?: string;
  body?: unknown;
  /** Raw body text; overrides body. */
  raw?: string;
  headers?: Record<string, string>;
  ip?: string;
  query?: string;
}

export async function callRoute(
  route: APIRoute,
  path: string,
  opts: CallOptions = {},
): Promise<Response> {
  const method = opts.method ?? 'POST';
  const url = new URL(`http://127.0.0.1${path}${opts.query ?? ''}`);
  const hasBody = method !== 'GET' && method !== 'HEAD';
  const text = opts.raw ?? (opts.body === undefined ? undefined : JSON.stringify(opts.body));
  const request = new Request(url, {
    method,
    headers: { 'content-type': 'application/json', ...opts.headers },
    body: hasBody ? text : undefined,
  });
  const context = {
    request,
    url,
    clientAddress: opts.ip ?? '192.0.2.1',
    locals: { requestId: 'test-request' },
    params: {},
  } as unknown as APIContext;
  return route(context);
}

/** POST a JSON body and read the answer. */
export async function postJson(
  route: APIRoute,
  path: string,
  body: unknown,
): Promise<{ status: number; json: Record<string, unknown> }> {
  const res = await callRoute(route, path, { body });
  return { status: res.status, json: (await res.json()) as Record<string, unknown> };
}
