/**
 * A report e-mail is sent once per form key: a double click (or a retried request) with the same
 * key gets the first send's result instead of a second message to the client. Kept in this server
 * process for a while; a failed send forgets its key so the owner can try again.
 */
const KEEP_MS = 10 * 60_000;
const sends = new Map<string, { at: number; id: Promise<string> }>();

export interface SendOutcome {
  id: string;
  /** True when this request repeated one already sent (nothing new went out). */
  repeated: boolean;
}

function prune(now: number): void {
  for (const [key, entry] of sends) if (now - entry.at > KEEP_MS) sends.delete(key);
}

/** Run `send` unless the same scope and key already did (or is doing) it. */
export async function sendOnce(
  scope: string,
  key: string | undefined,
  send: () => Promise<string>,
  now: number = Date.now(),
): Promise<SendOutcome> {
  if (!key) return { id: await send(), repeated: false };
  prune(now);
  const full = `${scope}\n${key}`;
  const known = sends.get(full);
  if (known) return { id: await known.id, repeated: true };
  // Stored before the first await, so a second request arriving meanwhile finds it.
  const id = send();
  sends.set(full, { at: now, id });
  try {
    return { id: await id, repeated: false };
  } catch (error) {
    sends.delete(full);
    throw error;
  }
}
