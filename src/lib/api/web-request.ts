/**
 * API v1 routes as Astro endpoints: the Astro context becomes an ApiRequest, the answer a web
 * Response. Used by src/pages/api/v1 (development server, route tests).
 */
import type { APIContext, APIRoute } from 'astro';
import type { ApiOperation, ApiRequest, BodyBytes } from './answer';
import { toResponse } from './answer';
import { routeClientAddress } from '../server/client-address';
import { concatChunks } from './body';

/** The body of a web Request with a byte cap and a deadline; stops reading at the cap. */
export async function readWebBody(
  request: Request,
  limit: number,
  deadlineMs: number,
): Promise<BodyBytes> {
  if (!request.body) return { ok: true, bytes: new Uint8Array(0) };
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  let late = false;
  const timer = setTimeout(() => {
    late = true;
    void reader.cancel().catch(() => {});
  }, deadlineMs);
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit) {
        void reader.cancel().catch(() => {});
        return { ok: false, reason: 'too_large' };
      }
      chunks.push(value);
    }
  } catch {
    return { ok: false, reason: late ? 'late' : 'unreadable' };
  } finally {
    clearTimeout(timer);
  }
  if (late) return { ok: false, reason: 'late' };
  return { ok: true, bytes: concatChunks(chunks, total) };
}

function fromContext(context: APIContext): ApiRequest {
  const { request } = context;
  return {
    method: request.method,
    url: context.url,
    header: (name) => request.headers.get(name),
    readBody: (limit, deadlineMs) => readWebBody(request, limit, deadlineMs),
    clientAddress: routeClientAddress(context),
    requestId: context.locals?.requestId ?? '-',
  };
}

/** An Astro endpoint running an API operation. */
export function astroRoute(operation: ApiOperation): APIRoute {
  return async (context) => toResponse(await operation(fromContext(context)));
}
