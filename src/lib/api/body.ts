/**
 * Reading a JSON request body safely: content type first (415), then the bytes with a 64 KiB cap
 * enforced while they stream in (413, the rest is never buffered), then the nesting depth, and
 * only then JSON.parse (400 for anything that is not a JSON document).
 */
import type { ApiAnswer, ApiRequest, BodyBytes } from './answer';
import { invalidBody, payloadTooLarge, unsupportedMediaType } from './errors';
import { withinDepth } from './json-depth';

/** Largest body accepted, bytes (API v1). */
export const MAX_BODY_BYTES = 64 * 1024;
/** Deepest nesting of objects and arrays accepted; real requests need 5. */
export const MAX_JSON_DEPTH = 20;
/** A body still arriving after this long is refused, so a slow sender cannot hold a request. */
export const BODY_DEADLINE_MS = 5_000;

export type BodyResult = { ok: true; value: unknown } | { ok: false; answer: ApiAnswer };

/** application/json or any application/…+json, in UTF-8 (the only charset JSON allows). */
export function isJsonContentType(header: string | null): boolean {
  if (!header) return false;
  if (header === 'application/json') return true; // the usual case, without the parsing below
  const [type, ...params] = header.split(';').map((s) => s.trim().toLowerCase());
  if (type !== 'application/json' && !/^application\/[\w.-]+\+json$/.test(type)) return false;
  return params.every((p) => !p.startsWith('charset=') || /^charset="?utf-8"?$/.test(p));
}

const UNREAD: Record<'unreadable' | 'late', string> = {
  unreadable: 'the body could not be read in full',
  late: 'the body did not arrive in time',
};

/** One strict decoder for every body: decode() without streaming keeps no state between calls. */
const UTF8 = new TextDecoder('utf-8', { fatal: true });

function refuse(answer: ApiAnswer): BodyResult {
  return { ok: false, answer };
}

/** The answer refusing the body from its headers alone (wrong type, declared too large), or null. */
export function refusedByHeaders(header: ApiRequest['header']): ApiAnswer | null {
  if (!isJsonContentType(header('content-type'))) return unsupportedMediaType();
  const declared = Number(header('content-length'));
  if (Number.isFinite(declared) && declared > MAX_BODY_BYTES)
    return payloadTooLarge(MAX_BODY_BYTES);
  return null;
}

/** Decode and parse body bytes read in full, or the error answer to send instead. */
export function parseJsonBody(read: BodyBytes): BodyResult {
  if (!read.ok) {
    if (read.reason === 'too_large') return refuse(payloadTooLarge(MAX_BODY_BYTES));
    return refuse(invalidBody(UNREAD[read.reason]));
  }
  let text: string;
  try {
    text = UTF8.decode(read.bytes);
  } catch {
    return refuse(invalidBody('the body is not valid UTF-8'));
  }
  if (text.trim() === '') return refuse(invalidBody('the body is empty; send a JSON object'));
  if (!withinDepth(text, MAX_JSON_DEPTH)) {
    return refuse(invalidBody(`the body nests deeper than ${MAX_JSON_DEPTH} levels`));
  }
  try {
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    const why = error instanceof SyntaxError ? `: ${error.message.slice(0, 120)}` : '';
    return refuse(invalidBody(`the body is not valid JSON${why}`));
  }
}

/**
 * Read and parse the request's JSON body, then answer with `use(value)`; or the error answer.
 * Synchronous when the body is already in: on the server's short path, each promise per request
 * cost more than the zod parse (async hooks are on for the page requests).
 */
export function withJsonBody(
  request: ApiRequest,
  use: (value: unknown) => ApiAnswer,
): ApiAnswer | Promise<ApiAnswer> {
  const refused = refusedByHeaders(request.header);
  if (refused) return refused;
  const answerBody = (read: BodyBytes): ApiAnswer => {
    const body = parseJsonBody(read);
    return body.ok ? use(body.value) : body.answer;
  };
  const read = request.readBody(MAX_BODY_BYTES, BODY_DEADLINE_MS);
  return read instanceof Promise ? read.then(answerBody) : answerBody(read);
}

/** Join body chunks into one array (no copy for a single chunk). */
export function concatChunks(chunks: Uint8Array[], total: number): Uint8Array {
  if (chunks.length === 1) return chunks[0];
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}
