import { QueryClientProvider } from '@tanstack/react-query';
import { renderRouter, waitFor } from 'expo-router/testing-library';
import { readsInPage, seedFirstReads, useFirstReads } from '@/hooks/use-first-reads';
import { meKeys } from '@/hooks/use-me';
import { musicianHomeKeys } from '@/hooks/use-musician-home';
import { todayKeys } from '@/hooks/use-today';
import type { Role } from '@/shared/schemas/role';
import { TodaySchema } from '@/shared/schemas/today';
import { today } from './session-fixtures';
import { createTestQueryClient, mockApi } from './test-utils';

// A page's first reads start once the account is known, before its screens' chunk has arrived: the same
// reads the server answers inside that page when it draws it (shared/web/first-reads.ts).
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

// The server draws a page with its first reads inside (server/services/first-reads.service.ts); the app puts
// them in its query cache before it draws, each checked by the schema the API's answer would be.
describe('first reads that came with the page', () => {
  const me = { id: 'u-1', name: 'Lena Holt', email: 'lena.holt@example.test', role: 'musician' };

  it('does put each read in the cache under its query, checked by its schema', () => {
    const client = createTestQueryClient();
    seedFirstReads(client, { '/api/me': me, '/api/today': today });
    expect(client.getQueryData(meKeys.current())).toEqual(me);
    expect(client.getQueryData(todayKeys.current())).toEqual(TodaySchema.parse(today));
    expect(client.getQueryData(musicianHomeKeys.current())).toBeUndefined();
  });

  it('does leave out a read its schema refuses, for the screen to ask the API', () => {
    const client = createTestQueryClient();
    seedFirstReads(client, { '/api/me': { ...me, role: 'conductor' }, '/api/today': { date: 'soon' } });
    expect(client.getQueryData(meKeys.current())).toBeUndefined();
    expect(client.getQueryData(todayKeys.current())).toBeUndefined();
  });

  it('does read the page data Expo Router leaves for the page, whatever its path', () => {
    expect(readsInPage()).toBeUndefined();
    globalThis.__EXPO_ROUTER_LOADER_DATA__ = { '/home?tab=1': { '/api/me': me } };
    try {
      expect(readsInPage()).toEqual({ '/api/me': me });
    } finally {
      globalThis.__EXPO_ROUTER_LOADER_DATA__ = undefined;
    }
  });
});
