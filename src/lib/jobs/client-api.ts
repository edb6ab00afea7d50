/** A refused call: the server's words as the message, plus its status and body (e.g. a 409's newer job). */
export class ApiError extends Error {
  constructor(
    message: string,
    readonly status: number,
    readonly body: Record<string, unknown>,
  ) {
    super(message);
  }

  /** The server's error code (e.g. plan_required), when it sent one. */
  get code(): string | undefined {
    return typeof this.body.error === 'string' ? this.body.error : undefined;
  }
}

/** Browser-side calls to the jobs API; every failure becomes an Error with the server's words. */
export async function api<T>(url: string, init?: { method?: string; body?: unknown }): Promise<T> {
  const r = await fetch(url, {
    method: init?.method ?? 'GET',
    headers: init?.body !== undefined ? { 'content-type': 'application/json' } : undefined,
    body: init?.body !== undefined ? JSON.stringify(init.body) : undefined,
  });
  if (r.status === 204) return undefined as T;
  const body = await r.json().catch(() => ({}));
  if (!r.ok) {
    const issues = (body.issues as { path: string; message: string }[] | undefined)?.map((i) => `${i.path} ${i.message}`).join('; ');
    throw new ApiError(issues || body.message || `Request failed (${r.status}).`, r.status, body);
  }
  return body as T;
}

export const TOOL_PAGES = { line: '/gravity-line', siphon: '/siphon', drain: '/drain' } as const;
/** Each saved tool's name, as the job page and the report show it. */
export const TOOL_NAMES = { line: 'Gravity line', siphon: 'Siphon', drain: 'Drain-down' } as const;

/** Link that reopens a saved calculation in its tool, marked so a save there becomes a revision. */
export function reopenHref(c: { id: string; jobId: string; tool: keyof typeof TOOL_PAGES; openPath: string | null }): string {
  const base = c.openPath ?? TOOL_PAGES[c.tool];
  const sep = base.includes('?') ? '&' : '?';
  return `${base}${sep}dwJob=${encodeURIComponent(c.jobId)}&dwRev=${encodeURIComponent(c.id)}`;
}
