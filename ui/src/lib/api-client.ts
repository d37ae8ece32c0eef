import type { ApiErrorBody } from '@fuelwright/shared';

/** Every API route lives under this prefix, on the same origin as the UI. */
export const API_BASE = '/api';

/** Messages for failures that carry no usable message from the server. */
export const FALLBACK_MESSAGES = {
  network: 'Cannot reach Fuelwright. Check the connection and try again.',
  tooMany: 'Too many attempts. Wait a minute, then try again.',
  server: 'Something went wrong on our side. Try again in a moment.',
  other: 'The request failed.',
} as const;

/** An error answer from the API (or no answer at all: status 0). */
export class ApiError extends Error {
  readonly status: number;
  /** Per-field validation messages from a 400, keyed by field name (dotted path when nested). */
  readonly fields: Readonly<Record<string, string[]>>;

  constructor(status: number, message: string, fields: Record<string, string[]> = {}) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.fields = fields;
  }

  /** Messages for one field, or an empty list. */
  fieldErrors(field: string): string[] {
    return this.fields[field] ?? [];
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/**
 * Called when any request other than the session check and sign-in answers 401: the session has
 * ended. The app installs a handler that clears the session and sends the user to sign-in.
 */
export type UnauthorizedHandler = (request: { method: string; path: string }) => void;

let unauthorizedHandler: UnauthorizedHandler | null = null;

/** Installs the 401 handler; returns a function that removes it again. */
export function setUnauthorizedHandler(handler: UnauthorizedHandler): () => void {
  unauthorizedHandler = handler;
  return () => {
    if (unauthorizedHandler === handler) unauthorizedHandler = null;
  };
}

/** A 401 from these paths is an answer, not an expired session. */
const PATHS_WITHOUT_401_REDIRECT = new Set(['/auth/me', '/auth/sign-in', '/auth/sign-out']);

export interface RequestOptions {
  body?: unknown;
  signal?: AbortSignal;
}

function messageFrom(status: number, body: Partial<ApiErrorBody> | undefined): string {
  const message = body?.message as unknown;
  if (typeof message === 'string' && message.trim() !== '') return message;
  if (Array.isArray(message) && message.length > 0) return message.join(' ');
  if (status === 429) return FALLBACK_MESSAGES.tooMany;
  if (status >= 500) return FALLBACK_MESSAGES.server;
  return FALLBACK_MESSAGES.other;
}

function fieldsFrom(body: Partial<ApiErrorBody> | undefined): Record<string, string[]> {
  const fields = body?.fields;
  if (!fields || typeof fields !== 'object') return {};
  const out: Record<string, string[]> = {};
  for (const [name, messages] of Object.entries(fields)) {
    if (Array.isArray(messages)) out[name] = messages.map(String);
    else if (typeof messages === 'string') out[name] = [messages];
  }
  return out;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (text === '') return undefined;
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/**
 * Sends one JSON request to the API with the session cookie and returns the parsed body.
 * Throws {@link ApiError} for any non-2xx answer or when the server cannot be reached.
 */
export async function apiRequest<T>(method: string, path: string, options: RequestOptions = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  const init: RequestInit = { method, credentials: 'same-origin', headers, signal: options.signal };
  if (options.body instanceof FormData) {
    // Multipart (a photo upload): the browser sets the Content-Type with its boundary.
    init.body = options.body;
  } else if (options.body !== undefined) {
    headers['Content-Type'] = 'application/json';
    init.body = JSON.stringify(options.body);
  }

  let response: Response;
  try {
    response = await fetch(`${API_BASE}${path}`, init);
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(0, FALLBACK_MESSAGES.network);
  }

  const body = await readJson(response);
  if (!response.ok) {
    const errorBody = (body && typeof body === 'object' ? body : undefined) as Partial<ApiErrorBody> | undefined;
    const error = new ApiError(response.status, messageFrom(response.status, errorBody), fieldsFrom(errorBody));
    if (response.status === 401 && !PATHS_WITHOUT_401_REDIRECT.has(path.split('?')[0])) {
      unauthorizedHandler?.({ method, path });
    }
    throw error;
  }
  return body as T;
}

export const api = {
  get: <T>(path: string, options?: Omit<RequestOptions, 'body'>) => apiRequest<T>('GET', path, options),
  post: <T>(path: string, body?: unknown, options?: RequestOptions) => apiRequest<T>('POST', path, { ...options, body }),
  patch: <T>(path: string, body?: unknown, options?: RequestOptions) => apiRequest<T>('PATCH', path, { ...options, body }),
  put: <T>(path: string, body?: unknown, options?: RequestOptions) => apiRequest<T>('PUT', path, { ...options, body }),
  delete: <T>(path: string, options?: RequestOptions) => apiRequest<T>('DELETE', path, options),
};
