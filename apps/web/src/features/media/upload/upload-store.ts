import { useSyncExternalStore } from 'react';
import { api } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { mediaKeys } from '../api/media-keys';
import { needsRetag, nextRetryAt, nextToStart, queueReducer, type QueueAction, type QueueItem, type ShotTags } from './queue';
import type { Transfer, TransferOutcome } from './transports';
import { sendPoster } from './poster';
import { ShotKeeper } from './shot-keeper';

/**
 * The transports (and tus-js-client with them) load with the first upload: the header's badge needs this store on
 * every page, the upload code only once a shot is taken.
 */
function startTransfer(item: QueueItem, onProgress: (p: number) => void): Transfer {
  let inner: Transfer | null = null;
  let aborted = false;
  const paused: TransferOutcome = { ok: false, message: 'Paused.', retryable: false };
  const done = import('./transports').then(
    (m) => {
      if (aborted) return paused;
      inner = m.startTransfer(item, onProgress);
      return inner.done;
    },
    (): TransferOutcome => ({
      ok: false,
      message: 'No connection to the workshop server. The shot is kept and will be sent again.',
      retryable: true,
      offline: true,
    }),
  );
  const abort = () => {
    aborted = true;
    inner?.abort();
  };
  return { done, abort };
}

/** Transfers at once: enough to keep a phone's uplink busy without starving progress bars. */
const PARALLEL = 2;

/**
 * The upload queue lives outside React so uploads carry on while the mechanic moves
 * between the capture, scope and job pages. The pure reducer decides; this runs it.
 */
class UploadStore {
  private items: QueueItem[] = [];
  private readonly listeners = new Set<() => void>();
  private readonly running = new Map<string, Transfer>();
  private readonly retagging = new Set<string>();
  private timer: ReturnType<typeof setTimeout> | null = null;
  /** Keeps every waiting shot in IndexedDB for the signed-in user (null before sign-in: nothing is kept). */
  private keeper: ShotKeeper | null = null;
  private online = typeof navigator === 'undefined' ? true : navigator.onLine;

  constructor() {
    if (typeof window === 'undefined') return;
    window.addEventListener('online', () => {
      this.online = true;
      this.dispatch({ type: 'retryNow' });
    });
    window.addEventListener('offline', () => {
      this.online = false;
      this.items = [...this.items]; // a new snapshot, so the badge redraws
      this.listeners.forEach((l) => l());
    });
  }

  isOnline = () => this.online;

  /**
   * The signed-in user's waiting shots come back from IndexedDB (after a reload, a closed tab or a restart) and
   * carry on. Another user's shots in memory are dropped first: one user never sees another's.
   */
  async attach(userId: number): Promise<void> {
    if (this.keeper?.userId === userId) {
      this.dispatch({ type: 'retryNow' }); // shots refused while the session had expired go again
      return;
    }
    this.drop();
    const keeper = new ShotKeeper(userId);
    this.keeper = keeper;
    const kept = await keeper.load();
    if (this.keeper !== keeper) return; // signed out meanwhile
    const known = new Set(this.items.map((i) => i.id));
    const fresh = kept.filter((i) => !known.has(i.id));
    if (fresh.length) this.apply({ type: 'add', items: fresh });
  }

  /** Sign-out: stops every transfer and empties the list; `keep` false also deletes the user's waiting shots. */
  async detach(keep: boolean): Promise<void> {
    const keeper = this.keeper;
    this.drop();
    if (keeper && !keep) await keeper.forgetAll();
  }

  private drop(): void {
    for (const t of this.running.values()) t.abort();
    this.running.clear();
    this.keeper = null;
    this.items = [];
    this.listeners.forEach((l) => l());
  }

  subscribe = (fn: () => void) => {
    this.listeners.add(fn);
    return () => void this.listeners.delete(fn);
  };

  snapshot = () => this.items;

  dispatch = (action: QueueAction): void => {
    const keeper = this.keeper;
    if (action.type === 'add' && keeper) {
      // Kept on the phone first, sent after: the shot shows at once as "saving", then queues.
      this.apply({ type: 'add', items: action.items.map((i) => ({ ...i, status: 'saving' as const })) });
      void keeper.save(action.items).then(() => action.items.forEach((i) => this.apply({ type: 'saved', id: i.id })));
      return;
    }
    if (keeper) void keeper.follow(action, this.items);
    this.apply(action);
  };

  private apply(action: QueueAction): void {
    if (action.type === 'pause') {
      this.running.get(action.id)?.abort();
      this.running.delete(action.id);
    }
    this.items = queueReducer(this.items, action);
    this.listeners.forEach((l) => l());
    this.pump();
  }

  private pump(): void {
    // Offline, nothing is tried (no attempts are spent); the 'online' event starts them again.
    if (this.online) for (const item of nextToStart(this.items, PARALLEL)) this.start(item);
    for (const item of this.items.filter(needsRetag)) this.retag(item);
    this.schedule();
  }

  private schedule(): void {
    if (this.timer) clearTimeout(this.timer);
    const at = nextRetryAt(this.items);
    this.timer = at === null ? null : setTimeout(() => this.dispatch({ type: 'retryDue', now: Date.now() }), Math.max(0, at - Date.now()));
  }

  private start(queued: QueueItem): void {
    // A nested dispatch may already have started it.
    const item = this.items.find((i) => i.id === queued.id);
    if (!item || item.status !== 'queued' || this.running.has(item.id)) return;
    const transfer = startTransfer(item, (progress) => this.dispatch({ type: 'progress', id: item.id, progress }));
    this.running.set(item.id, transfer);
    this.dispatch({ type: 'started', id: item.id });
    void transfer.done.then((outcome) => {
      if (this.running.get(item.id) !== transfer) return;
      this.running.delete(item.id);
      if (outcome.ok) {
        this.dispatch({ type: 'stored', id: item.id, assetId: outcome.assetId, tags: item.tags });
        void queryClient.invalidateQueries({ queryKey: mediaKeys.ofJob(item.jobId) });
        if (item.file.type.startsWith('video/')) this.poster(item.jobId, outcome.assetId, item.file);
      } else {
        const { message, retryable, code, offline } = outcome;
        this.dispatch({ type: 'failed', id: item.id, message, retryable, now: Date.now(), code, offline });
      }
    });
  }

  private poster(jobId: number, assetId: number, file: File): void {
    void sendPoster(jobId, assetId, file)
      .then((ok) => (ok ? queryClient.invalidateQueries({ queryKey: mediaKeys.ofJob(jobId) }) : undefined))
      .catch(() => undefined);
  }

  /** Tags changed after the shot was sent: bring the stored asset in line. */
  private retag(item: QueueItem): void {
    if (this.retagging.has(item.id) || item.assetId === null) return;
    this.retagging.add(item.id);
    const tags: ShotTags = { ...item.tags };
    void api(`/jobs/${item.jobId}/media/${item.assetId}`, { method: 'PATCH', body: tags })
      .then(() => {
        this.retagging.delete(item.id);
        this.dispatch({ type: 'tagsSaved', id: item.id, tags });
        void queryClient.invalidateQueries({ queryKey: mediaKeys.ofJob(item.jobId) });
      })
      .catch(() => {
        this.retagging.delete(item.id);
        setTimeout(() => this.pump(), 3000);
      });
  }

  /** Drops a shot from the list; one being sent is paused first so nothing half-sent lingers. */
  remove(id: string): void {
    if (this.running.has(id)) this.dispatch({ type: 'pause', id });
    this.running.delete(id);
    this.dispatch({ type: 'remove', id });
  }
}

export const uploadStore = new UploadStore();

/** How many shots are not yet stored on the server (refused ones included: they wait for a person). */
export function useWaitingCount(): number {
  const all = useSyncExternalStore(uploadStore.subscribe, uploadStore.snapshot);
  return all.filter((i) => i.status !== 'done').length;
}

/** Whether the phone says it has a network (redrawn on the browser's online and offline events). */
export function useOnline(): boolean {
  useSyncExternalStore(uploadStore.subscribe, uploadStore.snapshot);
  return uploadStore.isOnline();
}

/** The queue's shots for one job. */
export function useUploadQueue(jobId: number): QueueItem[] {
  const all = useSyncExternalStore(uploadStore.subscribe, uploadStore.snapshot);
  return all.filter((i) => i.jobId === jobId);
}

/** After sign-in (or on app open): the user's kept shots come back and carry on. */
export const attachShots = (userId: number): Promise<void> => uploadStore.attach(userId);
/** At sign-out: `keep` leaves the user's waiting shots on the phone for their next sign-in; otherwise they are deleted. */
export const detachShots = (keep: boolean): Promise<void> => uploadStore.detach(keep);
