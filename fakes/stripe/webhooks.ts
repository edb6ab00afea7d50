import Stripe from 'stripe';
import type { Obj, Store } from './store';
import { newId } from './store';

/** How the fake delivers events to the app; chaos duplicates and reorders them. */
export interface DeliveryConfig {
  url: string;
  secret: string;
  chaos: boolean;
  /** First retry delay; each further retry doubles it (capped at 5 s). */
  retryMs: number;
  maxAttempts: number;
}

export interface DeliveryRecord {
  eventId: string;
  type: string;
  attempts: number;
  status: 'pending' | 'delivered' | 'failed';
  lastStatus?: number;
  copies: number;
  /** Position in arrival order of its first successful delivery (shows reordering). */
  arrival?: number;
}

const signer = new Stripe('sk_fake_signer');
const API_VERSION = '2026-10-28.endive';

/** Events waiting, being sent or done; `pending` counts deliveries not yet finished. */
export class Deliveries {
  readonly records = new Map<string, DeliveryRecord>();
  private inFlight = 0;
  private batch: Obj[] = [];
  private batchTimer: NodeJS.Timeout | undefined;
  private seed = 20261201;
  private arrivals = 0;

  constructor(
    private readonly store: Store,
    public config: DeliveryConfig,
  ) {}

  get pending(): number {
    return this.inFlight + this.batch.length;
  }

  /** Record an event and queue it; with chaos, events of one burst go out shuffled. */
  emit(type: string, object: Obj, previous?: Obj): Obj {
    const event: Obj = {
      id: newId('evt'),
      object: 'event',
      api_version: API_VERSION,
      created: this.store.now(),
      data: previous
        ? { object: structuredClone(object), previous_attributes: previous }
        : { object: structuredClone(object) },
      livemode: false,
      pending_webhooks: 1,
      request: { id: null, idempotency_key: null },
      type,
    };
    this.store.state.events.push(event);
    this.records.set(event.id, {
      eventId: event.id,
      type,
      attempts: 0,
      status: 'pending',
      copies: 1,
    });
    if (!this.config.url) return event;
    this.batch.push(event);
    clearTimeout(this.batchTimer);
    this.batchTimer = setTimeout(() => this.flush(), this.config.chaos ? 60 : 5);
    return event;
  }

  /** Deliver a past event again, unchanged, as a replayed delivery would arrive. */
  resend(event: Obj): void {
    const record = this.records.get(event.id);
    if (record) record.copies += 1;
    else
      this.records.set(event.id, {
        eventId: event.id,
        type: event.type,
        attempts: 0,
        status: 'pending',
        copies: 1,
      });
    void this.send(event, 1);
  }

  private flush(): void {
    const events = this.batch;
    this.batch = [];
    if (this.config.chaos) this.shuffle(events);
    for (const event of events) {
      void this.send(event, 1);
      if (this.config.chaos && this.random() < 0.5) {
        this.records.get(event.id)!.copies += 1;
        this.inFlight += 1;
        setTimeout(
          () => void this.send(event, 1).finally(() => (this.inFlight -= 1)),
          50 + this.random() * 250,
        );
      }
    }
  }

  private async send(event: Obj, attempt: number): Promise<void> {
    const record = this.records.get(event.id)!;
    this.inFlight += 1;
    try {
      const payload = JSON.stringify(event);
      const header = signer.webhooks.generateTestHeaderString({
        payload,
        secret: this.config.secret,
      });
      record.attempts += 1;
      const res = await fetch(this.config.url, {
        method: 'POST',
        headers: {
          'content-type': 'application/json; charset=utf-8',
          'stripe-signature': header,
          'user-agent': 'FakeStripe/1.0',
        },
        body: payload,
        signal: AbortSignal.timeout(10_000),
      }).catch(() => undefined);
      record.lastStatus = res?.status;
      await res?.arrayBuffer().catch(() => undefined);
      if (res && res.status >= 200 && res.status < 300) {
        if (record.status !== 'delivered') record.arrival = ++this.arrivals;
        record.status = 'delivered';
        return;
      }
      if (attempt >= this.config.maxAttempts) {
        if (record.status !== 'delivered') record.status = 'failed';
        return;
      }
      await new Promise((r) =>
        setTimeout(r, Math.min(this.config.retryMs * 2 ** (attempt - 1), 5000)),
      );
      await this.send(event, attempt + 1);
    } finally {
      this.inFlight -= 1;
    }
  }

  /** Deterministic pseudo-random numbers (mulberry32) so a chaotic run can be repeated. */
  private random(): number {
    let t = (this.seed += 0x6d2b79f5);
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }

  private shuffle(events: Obj[]): void {
    for (let i = events.length - 1; i > 0; i--) {
      const j = Math.floor(this.random() * (i + 1));
      [events[i], events[j]] = [events[j], events[i]];
    }
  }
}
