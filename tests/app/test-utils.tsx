import type { ReactElement } from 'react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { renderRouter } from 'expo-router/testing-library';

/** A fresh query client per test: no retries, and no garbage-collection timer keeping jest alive. */
export function createTestQueryClient(): QueryClient {
  return new QueryClient({
    defaultOptions: { queries: { retry: false, gcTime: Infinity }, mutations: { retry: false } },
  });
}

/** Renders one screen inside a router (for links) and a query client, at `/`. */
export function renderScreen(element: ReactElement, client: QueryClient = createTestQueryClient()) {
  return renderRouter(
    {
      index: () => <QueryClientProvider client={client}>{element}</QueryClientProvider>,
      'sign-in': () => null,
      'sign-up': () => null,
      'forgot-password': () => null,
    },
    { initialUrl: '/' },
  );
}

type Routes = Record<string, { status: number; body: unknown }>;

export interface RecordedCall {
  method: string;
  path: string;
  body: unknown;
}

/** Answers fetch from a table of `METHOD /path` entries and records what was asked. */
export function mockApi(routes: Routes): RecordedCall[] {
  const calls: RecordedCall[] = [];
  jest.spyOn(global, 'fetch').mockImplementation(async (input, init) => {
    const url = new URL(typeof input === 'string' ? input : input instanceof URL ? input.href : input.url);
    const method = init?.method ?? 'GET';
    const body = typeof init?.body === 'string' ? JSON.parse(init.body) : undefined;
    calls.push({ method, path: url.pathname, body });
    const answer = routes[`${method} ${url.pathname}`];
    if (!answer) return new Response(JSON.stringify({ error: { code: 'not_found', message: 'No route.' } }), { status: 404 });
    return new Response(JSON.stringify(answer.body), { status: answer.status });
  });
  return calls;
}
