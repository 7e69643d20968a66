import { ApiError } from '@/lib/api-client';
import { createCheckInQueue } from '@/lib/check-in-queue';
import { memoryStore } from '@/lib/local-store';
import type { CheckInUpload } from '@/shared/schemas/today';
import { resultOf } from './session-fixtures';

const morning = { kind: 'next_morning' as const, date: '2027-03-01', pain: 0, redFlags: [] };
const retryable = (error: unknown) => error instanceof ApiError && (error.status === 0 || error.status >= 500);

afterEach(() => jest.useRealTimers());

describe('check-in queue', () => {
  it('keeps a check-in through failed sends and saves it once, with the same client key, when the network returns', async () => {
    jest.useFakeTimers();
    const sent: CheckInUpload[] = [];
    let failuresLeft = 2;
    const send = jest.fn(async (upload: CheckInUpload) => {
      sent.push(upload);
      if (failuresLeft > 0) {
        failuresLeft -= 1;
        throw new ApiError(0, 'network', 'offline');
      }
      return resultOf({ id: 'saved-1' });
    });
    const store = memoryStore();
    const queue = createCheckInQueue({ store, send, retryable, baseDelayMs: 1_000, newKey: () => 'fixed-key-1' });

    const key = queue.enqueue(morning);
    await Promise.resolve();
    await jest.advanceTimersByTimeAsync(0);
    expect(queue.outcome(key)).toEqual({ status: 'waiting', attempts: 1 });
    expect(JSON.parse(store.read('ritorno.check-in-queue.v1') ?? '[]')).toHaveLength(1);

    await jest.advanceTimersByTimeAsync(999);
    expect(send).toHaveBeenCalledTimes(1);
    await jest.advanceTimersByTimeAsync(1);
    expect(send).toHaveBeenCalledTimes(2);
    // Backoff doubles: the third try comes 2 s after the second.
    await jest.advanceTimersByTimeAsync(1_999);
    expect(send).toHaveBeenCalledTimes(2);
    await jest.advanceTimersByTimeAsync(1);

    expect(send).toHaveBeenCalledTimes(3);
    expect(new Set(sent.map((upload) => upload.clientKey))).toEqual(new Set([key]));
    expect(queue.outcome(key)).toMatchObject({ status: 'saved', result: { id: 'saved-1' } });
    expect(queue.pendingCount()).toBe(0);
    expect(JSON.parse(store.read('ritorno.check-in-queue.v1') ?? '[]')).toEqual([]);
  });

  it('picks up check-ins left on the device by an earlier visit and sends them', async () => {
    const store = memoryStore();
    store.write('ritorno.check-in-queue.v1', JSON.stringify([{ clientKey: 'next_morning-2027-03-01-left', checkIn: morning, attempts: 3 }]));
    const send = jest.fn(async () => resultOf({}));
    const queue = createCheckInQueue({ store, send, retryable });
    expect(queue.outcome('next_morning-2027-03-01-left')).toEqual({ status: 'waiting', attempts: 3 });
    await queue.flush();
    expect(send).toHaveBeenCalledWith({ clientKey: 'next_morning-2027-03-01-left', checkIn: morning });
    expect(queue.outcome('next_morning-2027-03-01-left')?.status).toBe('saved');
  });

  it('drops a check-in the server refuses as invalid instead of retrying it for ever', async () => {
    const send = jest.fn(async () => {
      throw new ApiError(422, 'future_date', 'A check-in cannot be dated after today.');
    });
    const queue = createCheckInQueue({ store: memoryStore(), send, retryable });
    const key = queue.enqueue(morning);
    await queue.flush();
    expect(queue.outcome(key)).toEqual({ status: 'rejected', message: 'A check-in cannot be dated after today.' });
    expect(send).toHaveBeenCalledTimes(1);
  });

  it('sends a check-in queued while an earlier send is finishing', async () => {
    const send = jest.fn(async () => resultOf({}));
    const queue = createCheckInQueue({ store: memoryStore(), send, retryable });
    const first = queue.flush();
    const key = queue.enqueue(morning);
    await first;
    await queue.flush();
    expect(send).toHaveBeenCalledTimes(1);
    expect(queue.outcome(key)?.status).toBe('saved');
  });
});
