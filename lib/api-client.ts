import { Platform } from 'react-native';
import type { z } from 'zod';
import { ApiErrorBodySchema } from '@/shared/schemas/api-error';

export interface FieldIssue {
  path: string;
  message: string;
}

/** Every failed API call becomes one of these, so screens can branch on status and code. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: FieldIssue[];

  constructor(status: number, code: string, message: string, issues: FieldIssue[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.issues = issues;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** Same origin on the web (the server serves the app); an explicit URL elsewhere. */
export function apiBaseUrl(): string {
  if (Platform.OS === 'web' && typeof window !== 'undefined') return window.location.origin;
  return process.env.EXPO_PUBLIC_API_URL ?? 'http://localhost:8080';
}

interface RequestOptions<S extends z.ZodType> {
  schema: S;
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  signal?: AbortSignal;
}

/** The body as JSON; null when it is empty or not JSON (a proxy's error page, a rate limit without body). */
export async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return null;
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

/** The one fetch wrapper: cookies included, JSON in and out, responses checked against the shared schema. */
export async function api<S extends z.ZodType>(path: string, options: RequestOptions<S>): Promise<z.output<S>> {
  let response: Response;
  try {
    response = await fetch(`${apiBaseUrl()}${path}`, {
      method: options.method ?? 'GET',
      credentials: 'include',
      headers: options.body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch {
    throw new ApiError(0, 'network', 'We could not reach Ritorno. Check your connection and try again.');
  }
  return readResult(response, options.schema);
}

/** Checks the status and parses the body with the schema: shared by `api` and `apiUpload`. */
async function readResult<S extends z.ZodType>(response: Response, schema: S): Promise<z.output<S>> {
  const json = await readJson(response);
  if (!response.ok) {
    const parsed = ApiErrorBodySchema.safeParse(json);
    if (parsed.success) {
      const { code, message, issues } = parsed.data.error;
      throw new ApiError(response.status, code, message, issues);
    }
    throw new ApiError(response.status, 'unexpected', `The server answered with status ${response.status}.`);
  }
  const result = schema.safeParse(json);
  if (!result.success) {
    throw new ApiError(response.status, 'bad_response', 'The server sent data this version of the app does not understand.');
  }
  return result.data;
}

/** Sizes and types the server refuses, in words a person can act on. */
const uploadRefusals: Record<number, string> = {
  413: 'The file is larger than 10 MB. Nothing was stored; reduce it (or scan at a lower resolution) and try again.',
  415: 'Only PDF, PNG, JPEG or WebP files can be attached, checked by their content. Nothing was stored.',
};

/** Multipart upload (documents): the browser sets the boundary, so no Content-Type header is sent. */
export async function apiUpload<S extends z.ZodType>(path: string, options: { schema: S; body: FormData }): Promise<z.output<S>> {
  let response: Response;
  try {
    response = await fetch(`${apiBaseUrl()}${path}`, {
      method: 'POST',
      credentials: 'include',
      headers: { Accept: 'application/json' },
      body: options.body,
    });
  } catch {
    throw new ApiError(0, 'network', 'We could not reach Ritorno. Check your connection and try again.');
  }
  try {
    return await readResult(response, options.schema);
  } catch (error) {
    const refusal = uploadRefusals[response.status];
    if (refusal && isApiError(error)) throw new ApiError(error.status, error.code, refusal, error.issues);
    throw error;
  }
}
