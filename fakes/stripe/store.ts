import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

/** A Stripe-shaped JSON object as the fake stores and returns it. */
export type Obj = Record<string, any>; // eslint-disable-line @typescript-eslint/no-explicit-any

/** Everything the fake remembers, persisted as one JSON file under its data folder. */
export interface FakeState {
  customers: Record<string, Obj>;
  products: Record<string, Obj>;
  prices: Record<string, Obj>;
  checkoutSessions: Record<string, Obj>;
  subscriptions: Record<string, Obj>;
  invoices: Record<string, Obj>;
  portalSessions: Record<string, Obj>;
  paymentMethods: Record<string, Obj>;
  events: Obj[];
  /** Seconds added to the wall clock by the test helper that ends a period. */
  clockOffset: number;
}

const EMPTY: FakeState = {
  customers: {},
  products: {},
  prices: {},
  checkoutSessions: {},
  subscriptions: {},
  invoices: {},
  portalSessions: {},
  paymentMethods: {},
  events: [],
  clockOffset: 0,
};

export class Store {
  state: FakeState;
  private readonly file: string;

  constructor(dataDir: string) {
    fs.mkdirSync(dataDir, { recursive: true });
    this.file = path.join(dataDir, 'fake-stripe.json');
    this.state = fs.existsSync(this.file)
      ? { ...structuredClone(EMPTY), ...JSON.parse(fs.readFileSync(this.file, 'utf8')) }
      : structuredClone(EMPTY);
  }

  /** Write the state atomically (temp file then rename) so a crash never leaves half a file. */
  save(): void {
    const tmp = `${this.file}.tmp`;
    fs.writeFileSync(tmp, JSON.stringify(this.state));
    fs.renameSync(tmp, this.file);
  }

  /** Fake "now" in Unix seconds, moved forward by the period test helper. */
  now(): number {
    return Math.floor(Date.now() / 1000) + this.state.clockOffset;
  }
}

/** A Stripe-style id: prefix, underscore, random letters and digits. */
export function newId(prefix: string): string {
  const alphabet = 'ABCDEFGHIJKLMNOPQRSTUVWXYZabcdefghijklmnopqrstuvwxyz0123456789';
  const bytes = randomBytes(24);
  return `${prefix}_${Array.from(bytes, (b) => alphabet[b % alphabet.length]).join('')}`;
}

/** A Stripe list object. */
export function listOf(data: Obj[], url: string, hasMore = false): Obj {
  return { object: 'list', data, has_more: hasMore, url };
}

/** Stripe's error body and status. */
export class StripeFakeError extends Error {
  constructor(
    readonly status: number,
    readonly type: string,
    message: string,
    readonly extra: Obj = {},
  ) {
    super(message);
  }

  body(): Obj {
    return { error: { type: this.type, message: this.message, ...this.extra } };
  }
}

export function missing(kind: string, id: string, param = 'id'): StripeFakeError {
  return new StripeFakeError(404, 'invalid_request_error', `No such ${kind}: '${id}'`, {
    code: 'resource_missing',
    param,
  });
}

export function invalid(message: string, param?: string): StripeFakeError {
  return new StripeFakeError(400, 'invalid_request_error', message, param ? { param } : {});
}
