// The device's sync engine (sync/SPEC.md S8, S12, S16, S26, S29-S31, S34): push the outbox in
// clock order, upload waiting photos, post comments written offline, then pull pages until up
// to date. One round at a time; failed
// rounds retry with exponential back-off.
import { maxPushMutations, pushBatchBytes, type PushResult } from '@/shared/api/sync';
import { backoffDelay } from '@/sync/backoff';
import type { SyncStore } from '@/lib/store/types';
import type { SyncStatusStore } from './status-store';
import { TransportError, type SyncTransport } from './transport';

export interface EngineOptions {
  store: SyncStore;
  transport: SyncTransport;
  status: SyncStatusStore;
  pageSize?: number;
  periodMs?: number;
  random?: () => number;
  timers?: Timers;
}

export interface Timers {
  setTimeout(run: () => void, ms: number): unknown;
  clearTimeout(handle: unknown): void;
}

/** Wrapped: a browser's setTimeout called as a method of another object throws "Illegal invocation". */
const globalTimers: Timers = {
  setTimeout: (run, ms) => setTimeout(run, ms),
  clearTimeout: (handle) => clearTimeout(handle as ReturnType<typeof setTimeout>),
};

/** S34: why the server refused a comment, in the words the thread shows beside it. */
const refusals: Record<number, string> = {
  400: 'the server found it invalid',
  403: 'you may not comment there (a viewer, or no longer in the group)',
  404: 'the sketch is not shared with you any more',
  409: 'its id was already used',
};

function fromBase64(s: string): Uint8Array {
  const bin = atob(s);
  return Uint8Array.from(bin, (c) => c.charCodeAt(0));
}

export class SyncEngine {
  private running: Promise<void> | null = null;
  private again = false;
  private failures = 0;
  private timer: unknown = null;
  private started = false;
  private readonly pageSize: number;
  private readonly periodMs: number;
  private readonly random: () => number;
  private readonly timers: Timers;

  constructor(private readonly o: EngineOptions) {
    this.pageSize = o.pageSize ?? 200;
    this.periodMs = o.periodMs ?? 60_000;
    this.random = o.random ?? Math.random;
    this.timers = o.timers ?? globalTimers;
  }

  /** S29: on start, then every period while online. */
  start(): void {
    this.started = true;
    void this.syncNow().catch(() => undefined);
  }

  stop(): void {
    this.started = false;
    if (this.timer) this.timers.clearTimeout(this.timer);
    this.timer = null;
  }

  /** S29: on reconnect, sync at once; going offline waits. */
  setOnline(online: boolean): void {
    const was = this.o.status.getState().online;
    this.o.status.setState({ online });
    if (online && !was) {
      this.failures = 0;
      void this.syncNow().catch(() => undefined);
    }
  }

  /** "Sync now": one round; a call during a round makes one more round follow (S29). */
  syncNow(): Promise<void> {
    if (this.running) {
      this.again = true;
      return this.running;
    }
    this.running = this.loop().finally(() => {
      this.running = null;
    });
    return this.running;
  }

  private async loop(): Promise<void> {
    do {
      this.again = false;
      await this.round();
    } while (this.again);
  }

  private async round(): Promise<void> {
    if (this.timer) this.timers.clearTimeout(this.timer);
    this.timer = null;
    this.o.status.setState({ syncing: true });
    try {
      await this.pushAll();
      await this.uploadAll();
      await this.sendComments();
      await this.pullAll();
      this.failures = 0;
      this.o.status.setState({ lastError: null, lastSyncedAt: new Date().toISOString(), online: true });
      this.schedule(this.periodMs);
    } catch (e) {
      this.failures++;
      const err = e instanceof TransportError ? e : null;
      this.o.status.setState({ lastError: e instanceof Error ? e.message : String(e), online: err?.kind !== 'network' });
      if (err?.kind !== 'unauthorized') this.schedule(backoffDelay(this.failures, this.random())); // S30
      throw e;
    } finally {
      this.o.status.setState({ syncing: false, ...(await this.o.store.counts()) });
    }
  }

  private schedule(ms: number): void {
    if (!this.started) return;
    this.timer = this.timers.setTimeout(() => void this.syncNow().catch(() => undefined), ms);
  }

  /** S8, S11: oldest first, batches under the count and size limits, until the outbox is empty. */
  private async pushAll(): Promise<void> {
    const deviceId = await this.o.store.deviceId();
    let alone = false;
    for (;;) {
      const box = await this.o.store.outbox(maxPushMutations);
      if (box.length === 0) return;
      let bytes = 0;
      const batch = alone ? box.slice(0, 1) : box.filter((m, i) => (bytes += JSON.stringify(m).length) <= pushBatchBytes || i === 0);
      let results: PushResult[];
      try {
        ({ results } = await this.o.transport.push({ deviceId, mutations: batch }));
      } catch (e) {
        // A 4xx (a body too large, a request the server cannot read) is refused again on every
        // retry: the mutations go one by one, and one refused alone is set aside like a
        // rejection (S24), so it never holds up the outbox.
        if (!(e instanceof TransportError && e.kind === 'client')) throw e;
        if (batch.length > 1) {
          alone = true;
          continue;
        }
        results = [{ mutationId: batch[0].mutationId, status: 'rejected', reason: 'invalid', message: e.message }];
      }
      if (results.length !== batch.length) throw new TransportError('server', 'The push answer does not cover the batch');
      await this.o.store.settle(batch, results);
      this.o.status.setState(await this.o.store.counts());
    }
  }

  /** S26: ask first, send only what the server lacks. */
  private async uploadAll(): Promise<void> {
    for (const u of await this.o.store.pendingUploads()) {
      if (!(await this.o.transport.hasUpload(u.sha256))) await this.o.transport.upload(u.sha256, u.mimeType, fromBase64(u.base64));
      await this.o.store.uploaded(u.sha256);
    }
  }

  /**
   * S34: after the push, since a comment needs its sketch shared on the server. A lost answer
   * fails the round (back-off, S30) and the retry's same id is answered with the comment made.
   */
  private async sendComments(): Promise<void> {
    for (const c of await this.o.store.commentsToSend()) {
      try {
        await this.o.transport.postComment(c.sketchId, { id: c.id, body: c.body });
        await this.o.store.commentSettled(c);
      } catch (e) {
        if (!(e instanceof TransportError && e.kind === 'client')) throw e;
        await this.o.store.commentSettled(c, `${refusals[e.status] ?? 'refused by the server'} (${e.message})`); // kept on the device, not retried
      }
    }
  }

  /** S16: store each page with its cursor before asking for the next. */
  private async pullAll(): Promise<void> {
    for (;;) {
      const page = await this.o.transport.pull(await this.o.store.cursor(), this.pageSize);
      const stored = await this.o.store.storePage(page);
      if (stored && !page.hasMore) return;
    }
  }
}
