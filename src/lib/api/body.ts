/**
 * Reading a JSON request body safely: content type first (415), then the bytes with a 64 KiB cap
 * enforced while they stream in (413, the rest is never buffered), then the nesting depth, and
 * only then JSON.parse (400 for anything that is not a JSON document).
 */
import { invalidBody, payloadTooLarge, unsupportedMediaType } from './errors';
import { withinDepth } from './json-depth';

/** Largest body accepted, bytes (API v1). */
export const MAX_BODY_BYTES = 64 * 1024;
/** Deepest nesting of objects and arrays accepted; real requests need 5. */
export const MAX_JSON_DEPTH = 20;
/** A body still arriving after this long is refused, so a slow sender cannot hold a request. */
export const BODY_DEADLINE_MS = 5_000;

export type BodyResult = { ok: true; value: unknown } | { ok: false; response: Response };

/** application/json or any application/…+json, in UTF-8 (the only charset JSON allows). */
export function isJsonContentType(header: string | null): boolean {
  if (!header) return false;
  const [type, ...params] = header.split(';').map((s) => s.trim().toLowerCase());
  if (type !== 'application/json' && !/^application\/[\w.-]+\+json$/.test(type)) return false;
  return params.every((p) => !p.startsWith('charset=') || /^charset="?utf-8"?$/.test(p));
}

type Bytes = { ok: true; bytes: Uint8Array } | { ok: false; response: Response };

async function readCapped(request: Request, limit: number): Promise<Bytes> {
  const declared = Number(request.headers.get('content-length'));
  if (Number.isFinite(declared) && declared > limit)
    return { ok: false, response: payloadTooLarge(limit) };
  if (!request.body) return { ok: true, bytes: new Uint8Array(0) };
  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  let late = false;
  const timer = setTimeout(() => {
    late = true;
    void reader.cancel().catch(() => {});
  }, BODY_DEADLINE_MS);
  try {
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      total += value.byteLength;
      if (total > limit) {
        void reader.cancel().catch(() => {});
        return { ok: false, response: payloadTooLarge(limit) };
      }
      chunks.push(value);
    }
  } catch {
    return { ok: false, response: invalidBody('the body could not be read in full') };
  } finally {
    clearTimeout(timer);
  }
  if (late) return { ok: false, response: invalidBody('the body did not arrive in time') };
  return { ok: true, bytes: concat(chunks, total) };
}

function concat(chunks: Uint8Array[], total: number): Uint8Array {
  if (chunks.length === 1) return chunks[0];
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

/** Read and parse the request's JSON body, or the error answer to send instead. */
export async function readJsonBody(request: Request): Promise<BodyResult> {
  if (!isJsonContentType(request.headers.get('content-type'))) {
    return { ok: false, response: unsupportedMediaType() };
  }
  const read = await readCapped(request, MAX_BODY_BYTES);
  if (!read.ok) return read;
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(read.bytes);
  } catch {
    return { ok: false, response: invalidBody('the body is not valid UTF-8') };
  }
  if (text.trim() === '')
    return { ok: false, response: invalidBody('the body is empty; send a JSON object') };
  if (!withinDepth(text, MAX_JSON_DEPTH)) {
    return {
      ok: false,
      response: invalidBody(`the body nests deeper than ${MAX_JSON_DEPTH} levels`),
    };
  }
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    const why = error instanceof SyntaxError ? `: ${error.message.slice(0, 120)}` : '';
    return { ok: false, response: invalidBody(`the body is not valid JSON${why}`) };
  }
}
