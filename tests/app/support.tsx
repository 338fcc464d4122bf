// Helpers for component tests: a fetch double that records calls and answers like the server,
// and rendering inside the app's providers.
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react-native';
import { queryClient } from '@/lib/query-client';

export type Call = { method: string; path: string; body: unknown; auth: string | null };

type Answer = { status: number; body?: unknown };

/** Replaces global fetch; `answer` decides each response (may return a promise to hold it). */
export function mockFetch(answer: (call: Call) => Answer | Promise<Answer>) {
  const calls: Call[] = [];
  global.fetch = jest.fn(async (url: string | URL | Request, init?: RequestInit) => {
    const call: Call = {
      method: init?.method ?? 'GET',
      path: String(url),
      body: init?.body ? JSON.parse(String(init.body)) : undefined,
      auth: new Headers(init?.headers).get('Authorization'),
    };
    calls.push(call);
    const { status, body } = await answer(call);
    return { ok: status >= 200 && status < 300, status, json: async () => body } as Response;
  }) as typeof fetch;
  return calls;
}

/** A promise with its resolve handle, to hold a response while the test looks at the busy state. */
export function deferred<T>() {
  let resolve!: (value: T) => void;
  const promise = new Promise<T>((r) => (resolve = r));
  return { promise, resolve };
}

export function apiError(status: number, code: string, message: string, fields?: Record<string, string>): Answer {
  return { status, body: { error: { code, message, ...(fields && { fields }) } } };
}

export function renderWithProviders(ui: React.ReactElement) {
  return render(<QueryClientProvider client={queryClient}>{ui}</QueryClientProvider>);
}
