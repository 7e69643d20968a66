import { QueryClientProvider } from '@tanstack/react-query';
import { renderRouter, waitFor } from 'expo-router/testing-library';
import { useFirstReads } from '@/hooks/use-first-reads';
import { musicianHomeKeys } from '@/hooks/use-musician-home';
import { todayKeys } from '@/hooks/use-today';
import type { Role } from '@/shared/schemas/role';
import { createTestQueryClient, mockApi } from './test-utils';

// A page's first reads start once the account is known, before its screens' chunk has arrived: the same
// reads the server preloads for that page (server/middleware/web-export.ts).
function renderAt(path: string, role: Role | undefined) {
  const client = createTestQueryClient();
  const calls = mockApi({
    'GET /api/today': { status: 200, body: {} },
    'GET /api/me/musician': { status: 200, body: {} },
  });
  function Probe() {
    useFirstReads(role);
    return null;
  }
  const page = () => (
    <QueryClientProvider client={client}>
      <Probe />
    </QueryClientProvider>
  );
  renderRouter({ home: page, plan: page }, { initialUrl: path });
  jest.useRealTimers();
  return { client, calls };
}

afterEach(() => jest.restoreAllMocks());

describe('first reads of a signed-in page', () => {
  it("asks for the day and the musician's summary on a musician's Today", async () => {
    const { client, calls } = renderAt('/home', 'musician');
    await waitFor(() => expect(calls.map((call) => call.path).sort()).toEqual(['/api/me/musician', '/api/today']));
    expect(client.getQueryState(todayKeys.current())).toBeDefined();
    expect(client.getQueryState(musicianHomeKeys.current())).toBeDefined();
  });

  it.each([
    ['before the account is known', '/home', undefined],
    ['for another role', '/home', 'teacher'],
    ["on a musician's other pages", '/plan', 'musician'],
  ] as const)('asks for nothing %s', async (_case, path, role) => {
    const { calls } = renderAt(path, role);
    // Give a stray request time to be made before saying none was.
    await new Promise((resolve) => setTimeout(resolve, 50));
    expect(calls).toEqual([]);
  });
});
