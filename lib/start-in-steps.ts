/**
 * Runs start-up steps one after another, giving the browser back its main thread between them.
 *
 * Started in one go, the app's modules ran as one task of about a second on a slow phone, during which
 * the page could not answer a tap (Lighthouse counts it as blocking time). The same work cut into steps,
 * each its own task, lets the browser paint and handle input in between. Nothing is skipped or
 * reordered: a step only runs modules earlier than they would have run anyway.
 */
/** One step; a step that returns a promise is waited for before the next. */
export type Step = () => unknown;

/** The browser's own yield where there is one, else a message to ourselves (no timer clamping). */
export function yieldToBrowser(): Promise<void> {
  const scheduler = (globalThis as { scheduler?: { yield?: () => Promise<void> } }).scheduler;
  if (typeof scheduler?.yield === 'function') return scheduler.yield();
  if (typeof MessageChannel === 'undefined') return new Promise((resolve) => setTimeout(resolve, 0));
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = () => {
      channel.port1.close();
      resolve();
    };
    channel.port2.postMessage(null);
  });
}

/** Each step in order, a yield before each; a failing step stops the rest and rejects with its error. */
export async function startInSteps(steps: readonly Step[], yieldNow: () => Promise<void> = yieldToBrowser): Promise<void> {
  for (const step of steps) {
    await yieldNow();
    await step();
  }
}
