import { act, renderHook } from '@testing-library/react-native';
import { useTakenOver } from '@/hooks/use-taken-over';

// What only the browser knows waits until React has taken the server-drawn page over (hooks/use-taken-over.ts).
describe('taking over a server-drawn page', () => {
  it('does answer false on the first render, then true, and true at once for what mounts afterwards', async () => {
    const seen: boolean[] = [];
    const first = renderHook(() => {
      const value = useTakenOver();
      seen.push(value);
      return value;
    });
    expect(seen[0]).toBe(false);
    await act(async () => undefined);
    expect(first.result.current).toBe(true);

    const later: boolean[] = [];
    renderHook(() => {
      const value = useTakenOver();
      later.push(value);
      return value;
    });
    expect(later[0]).toBe(true);
  });
});
