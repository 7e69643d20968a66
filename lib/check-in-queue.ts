import { z } from 'zod';
import { CheckInSchema, type CheckIn } from '@/shared/schemas/check-in';
import type { CheckInResult, CheckInUpload } from '@/shared/schemas/today';
import type { KeyValueStore } from './local-store';

const STORE_KEY = 'ritorno.check-in-queue.v1';

const EntrySchema = z.object({
  clientKey: z.string(),
  checkIn: CheckInSchema,
  attempts: z.number().int().min(0),
});
type Entry = z.infer<typeof EntrySchema>;

export type SendOutcome =
  | { status: 'waiting'; attempts: number }
  | { status: 'saved'; result: CheckInResult }
  | { status: 'rejected'; message: string };

export interface CheckInQueueDeps {
  store: KeyValueStore;
  send: (upload: CheckInUpload) => Promise<CheckInResult>;
  /** Whether a failed send is worth trying again (no network, a server error, signed out for now). */
  retryable: (error: unknown) => boolean;
  schedule?: (run: () => void, ms: number) => void;
  newKey?: () => string;
  baseDelayMs?: number;
  maxDelayMs?: number;
}

export interface CheckInQueue {
  /** Keeps the check-in on the device and starts sending it; returns its client key. */
  enqueue(checkIn: CheckIn): string;
  flush(): Promise<void>;
  outcome(clientKey: string): SendOutcome | undefined;
  pendingCount(): number;
  subscribe(listener: () => void): () => void;
  /** Changes whenever an outcome does (for useSyncExternalStore). */
  version(): number;
  onSaved(listener: (result: CheckInResult) => void): () => void;
}

function randomKey(): string {
  const c = globalThis.crypto;
  if (c && typeof c.randomUUID === 'function') return c.randomUUID();
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 12)}`;
}

/**
 * Check-ins wait on the device until the server has them: each keeps one client key for all its
 * retries, so the server (which answers a repeated key with the first result) saves it exactly once.
 * Retries back off exponentially up to a ceiling.
 */
export function createCheckInQueue(deps: CheckInQueueDeps): CheckInQueue {
  const schedule = deps.schedule ?? ((run, ms) => void setTimeout(run, ms));
  const newKey = deps.newKey ?? randomKey;
  const base = deps.baseDelayMs ?? 2_000;
  const ceiling = deps.maxDelayMs ?? 60_000;
  const parsed = z.array(EntrySchema).safeParse(JSON.parse(deps.store.read(STORE_KEY) ?? '[]'));
  let pending: Entry[] = parsed.success ? parsed.data : [];
  const outcomes = new Map<string, SendOutcome>();
  const listeners = new Set<() => void>();
  const savedListeners = new Set<(result: CheckInResult) => void>();
  let version = 0;
  let flushing: Promise<void> | null = null;
  let retryScheduled = false;

  const persist = () => deps.store.write(STORE_KEY, JSON.stringify(pending));
  const changed = () => {
    version += 1;
    for (const listener of listeners) listener();
  };

  async function drain(): Promise<void> {
    while (pending.length > 0) {
      const entry = pending[0];
      if (!entry) return;
      try {
        const result = await deps.send({ clientKey: entry.clientKey, checkIn: entry.checkIn });
        pending = pending.slice(1);
        persist();
        outcomes.set(entry.clientKey, { status: 'saved', result });
        for (const listener of savedListeners) listener(result);
        changed();
      } catch (error) {
        if (!deps.retryable(error)) {
          pending = pending.slice(1);
          persist();
          const message = error instanceof Error ? error.message : 'The server refused this check-in.';
          outcomes.set(entry.clientKey, { status: 'rejected', message });
          changed();
          continue;
        }
        entry.attempts += 1;
        persist();
        changed();
        if (!retryScheduled) {
          retryScheduled = true;
          const delay = Math.min(ceiling, base * 2 ** (entry.attempts - 1));
          schedule(() => {
            retryScheduled = false;
            void queue.flush();
          }, delay);
        }
        return;
      }
    }
  }

  const queue: CheckInQueue = {
    enqueue(checkIn) {
      const clientKey = `${checkIn.kind}-${checkIn.date}-${newKey()}`;
      pending = [...pending, { clientKey, checkIn, attempts: 0 }];
      persist();
      changed();
      void queue.flush();
      return clientKey;
    },
    flush() {
      // A check-in queued while a drain is finishing would be missed by it: drain again afterwards.
      if (flushing) return flushing.then(() => (pending.length > 0 && !retryScheduled ? queue.flush() : undefined));
      flushing = drain().finally(() => {
        flushing = null;
      });
      return flushing;
    },
    outcome(clientKey) {
      const waiting = pending.find((entry) => entry.clientKey === clientKey);
      if (waiting) return { status: 'waiting', attempts: waiting.attempts };
      return outcomes.get(clientKey);
    },
    pendingCount: () => pending.length,
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    version: () => version,
    onSaved(listener) {
      savedListeners.add(listener);
      return () => savedListeners.delete(listener);
    },
  };
  return queue;
}
