import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/** One stored attachment: the bytes as the API sent them (base64), with their name and type. */
export interface StoredAttachment {
  id: string;
  filename: string;
  contentType: string;
  /** Base64 of the bytes. */
  content: string;
  size: number;
}

/** One message as the fake received it, plus the fields the API answers with. */
export interface StoredEmail {
  id: string;
  createdAt: string;
  from: string;
  to: string[];
  cc: string[] | null;
  bcc: string[] | null;
  replyTo: string[] | null;
  subject: string;
  html: string | null;
  text: string | null;
  headers: Record<string, string> | null;
  tags: { name: string; value: string }[] | null;
  attachments: StoredAttachment[];
}

/**
 * Messages kept as one JSON file each under `dir`, written to a temp name and renamed so a crash
 * never leaves half a message. Ids sort by time, so the listing needs no index.
 */
export class EmailStore {
  constructor(private readonly dir: string) {
    fs.mkdirSync(dir, { recursive: true });
  }

  save(email: Omit<StoredEmail, 'id' | 'createdAt'>): StoredEmail {
    const now = new Date();
    const id = `${now.getTime().toString(36).padStart(9, '0')}-${randomUUID()}`;
    const stored: StoredEmail = { id, createdAt: now.toISOString(), ...email };
    const file = path.join(this.dir, `${id}.json`);
    const tmp = `${file}.tmp`;
    fs.writeFileSync(tmp, JSON.stringify(stored));
    fs.renameSync(tmp, file);
    return stored;
  }

  get(id: string): StoredEmail | null {
    if (!/^[\w-]+$/.test(id)) return null;
    try {
      return JSON.parse(fs.readFileSync(path.join(this.dir, `${id}.json`), 'utf8')) as StoredEmail;
    } catch {
      return null;
    }
  }

  /** Newest first, optionally only messages addressed to `to` (case-insensitive). */
  list(to?: string): StoredEmail[] {
    const ids = fs
      .readdirSync(this.dir)
      .filter((f) => f.endsWith('.json'))
      .map((f) => f.slice(0, -5))
      .sort()
      .reverse();
    const all = ids.map((id) => this.get(id)).filter((e): e is StoredEmail => e !== null);
    if (!to) return all;
    const want = to.toLowerCase();
    return all.filter((e) => [...e.to, ...(e.cc ?? []), ...(e.bcc ?? [])].some((a) => a.toLowerCase().includes(want)));
  }
}
