// A device for the fault tests: the real sync engine and LocalStore over in-memory tables
// (the same interface as expo-sqlite), talking HTTP to the real server, with faults to inject.
import { LocalStore } from '@/lib/store/local-store';
import { nodeCrypto } from '../sync/node-crypto';
import { memoryDisk, memoryTables, type MemoryDisk } from '@/lib/store/memory';
import { SyncEngine } from '@/lib/sync/engine';
import { createSyncStatusStore } from '@/lib/sync/status-store';
import { httpTransport, TransportError, type SyncTransport } from '@/lib/sync/transport';

export interface Faults {
  /** Let the server apply the next n pushes, then lose their answers. */
  dropPushAnswers: number;
  /** Let the server make the next n comments, then lose their answers. */
  dropCommentAnswers: number;
  /** Send every push twice. */
  duplicatePushes: boolean;
  /** Lose the network after this many more pulls (Infinity: never). */
  pullsBeforeOutage: number;
  offline: boolean;
}

export class Device {
  readonly disk: MemoryDisk = memoryDisk();
  faults: Faults = { dropPushAnswers: 0, dropCommentAnswers: 0, duplicatePushes: false, pullsBeforeOutage: Infinity, offline: false };
  store!: LocalStore;
  engine!: SyncEngine;
  status = createSyncStatusStore();
  pushes = 0;
  pulls = 0;
  commentPosts = 0;

  constructor(
    private readonly url: () => string,
    private readonly token: string,
    private readonly pageSize = 200,
  ) {
    this.reload();
  }

  /** A page reload / app restart: everything in memory is gone except the "disk". */
  reload(): void {
    this.store = new LocalStore(memoryTables(this.disk), nodeCrypto);
    this.status = createSyncStatusStore();
    this.engine = new SyncEngine({ store: this.store, transport: this.transport(), status: this.status, pageSize: this.pageSize, random: () => 0 });
  }

  private transport(): SyncTransport {
    const real = httpTransport({ baseUrl: this.url, token: () => this.token });
    const gate = () => {
      if (this.faults.offline) throw new TransportError('network', 'offline (test)');
    };
    return {
      push: async (req) => {
        gate();
        this.pushes++;
        const answer = await real.push(req);
        if (this.faults.duplicatePushes) await real.push(req);
        if (this.faults.dropPushAnswers > 0) {
          this.faults.dropPushAnswers--;
          throw new TransportError('network', 'answer lost (test)');
        }
        return answer;
      },
      pull: async (cursor, limit) => {
        gate();
        if (this.faults.pullsBeforeOutage-- <= 0) throw new TransportError('network', 'outage (test)');
        this.pulls++;
        return real.pull(cursor, limit);
      },
      hasUpload: async (h) => (gate(), real.hasUpload(h)),
      upload: async (h, m, b) => (gate(), real.upload(h, m, b)),
      postComment: async (sketchId, req) => {
        gate();
        this.commentPosts++;
        const answer = await real.postComment(sketchId, req);
        if (this.faults.dropCommentAnswers > 0) {
          this.faults.dropCommentAnswers--;
          throw new TransportError('network', 'answer lost (test)');
        }
        return answer;
      },
    };
  }

  /** Runs one sync round; resolves to the error if it failed. */
  sync(): Promise<unknown> {
    return this.engine.syncNow().then(
      () => null,
      (e: unknown) => e,
    );
  }

  async sketchesById() {
    return new Map((await this.store.list({ includeDeleted: true })).map((s) => [s.id, s]));
  }
}
