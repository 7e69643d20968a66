import { runLoad } from '@/bench/load';

jest.setTimeout(120_000);

// A short run for every test pass; `npm run load` runs the same for longer with more musicians.
describe('under load', () => {
  it('serves many musicians reading and writing at once with no error, lock or lost check-in', async () => {
    const report = await runLoad({ musicians: 12, seconds: 4, port: 8193 });
    expect(report.requests).toBeGreaterThan(100);
    expect(report.errors).toBe(0);
    expect(report.non2xx).toBe(0);
    expect(report.lockedAnswers).toBe(0);
    expect(report.acknowledgedWrites).toBeGreaterThan(20);
    expect(report.lostWrites).toBe(0);
    expect(report.duplicateWrites).toBe(0);
    // Writes still in flight when the clock ran out may be stored without an answer; never more than sent.
    expect(report.storedWrites).toBeGreaterThanOrEqual(report.acknowledgedWrites);
    expect(report.storedWrites).toBeLessThanOrEqual(report.attemptedWrites);
  });
});
