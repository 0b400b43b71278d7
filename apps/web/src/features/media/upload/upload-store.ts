import { useSyncExternalStore } from 'react';
import { api } from '../../../lib/api-client';
import { queryClient } from '../../../lib/query-client';
import { mediaKeys } from '../api/media-keys';
import { needsRetag, nextRetryAt, nextToStart, queueReducer, type QueueAction, type QueueItem, type ShotTags } from './queue';
import { startTransfer, type Transfer } from './transports';
import { sendPoster } from './poster';

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

  constructor() {
    if (typeof window !== 'undefined') window.addEventListener('online', () => this.dispatch({ type: 'retryNow' }));
  }

  subscribe = (fn: () => void) => {
    this.listeners.add(fn);
    return () => void this.listeners.delete(fn);
  };

  snapshot = () => this.items;

  dispatch = (action: QueueAction): void => {
    if (action.type === 'pause') {
      this.running.get(action.id)?.abort();
      this.running.delete(action.id);
    }
    this.items = queueReducer(this.items, action);
    this.listeners.forEach((l) => l());
    this.pump();
  };

  private pump(): void {
    for (const item of nextToStart(this.items, PARALLEL)) this.start(item);
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
      } else this.dispatch({ type: 'failed', id: item.id, message: outcome.message, retryable: outcome.retryable, now: Date.now(), code: outcome.code });
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

/** The queue's shots for one job. */
export function useUploadQueue(jobId: number): QueueItem[] {
  const all = useSyncExternalStore(uploadStore.subscribe, uploadStore.snapshot);
  return all.filter((i) => i.jobId === jobId);
}
