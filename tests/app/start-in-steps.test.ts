import { startInSteps, yieldToBrowser } from '@/lib/start-in-steps';

// The web app's start runs its modules in steps with the main thread handed back in between (index.ts).
describe('starting in steps', () => {
  it('runs every step once, in order, each after a yield to the browser', async () => {
    const events: string[] = [];
    const yieldNow = async () => {
      events.push('yield');
    };
    await startInSteps(
      ['one', 'two', 'three'].map((name) => () => events.push(name)),
      yieldNow,
    );
    expect(events).toEqual(['yield', 'one', 'yield', 'two', 'yield', 'three']);
  });

  it('waits for a step that returns a promise before the next one', async () => {
    const events: string[] = [];
    let finish: () => void = () => undefined;
    const started = startInSteps(
      [() => new Promise<void>((resolve) => (finish = () => (events.push('first done'), resolve()))), () => events.push('second')],
      async () => undefined,
    );
    await new Promise((resolve) => setTimeout(resolve, 10));
    expect(events).toEqual([]);
    finish();
    await started;
    expect(events).toEqual(['first done', 'second']);
  });

  it('does not run a step before the browser has had its turn', async () => {
    let ran = false;
    const started = startInSteps([() => (ran = true)]);
    // The caller's own synchronous work finishes first: nothing ran inside the call.
    expect(ran).toBe(false);
    await started;
    expect(ran).toBe(true);
  });

  it('stops at a failing step and rejects with its error, leaving the rest unrun', async () => {
    const ran: string[] = [];
    const failure = new Error('module failed');
    const steps = [
      () => ran.push('first'),
      () => {
        throw failure;
      },
      () => ran.push('never'),
    ];
    await expect(startInSteps(steps, async () => undefined)).rejects.toBe(failure);
    expect(ran).toEqual(['first']);
  });

  it('hands the thread back for a whole task, not just a microtask', async () => {
    const order: string[] = [];
    const yielded = yieldToBrowser().then(() => order.push('after yield'));
    await Promise.resolve();
    order.push('microtask');
    await yielded;
    expect(order).toEqual(['microtask', 'after yield']);
  });
});
