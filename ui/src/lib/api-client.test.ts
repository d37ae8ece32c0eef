import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi } from '../test-utils';
import { api, ApiError, FALLBACK_MESSAGES, setUnauthorizedHandler } from './api-client';

describe('api client', () => {
  let uninstall: (() => void) | undefined;
  afterEach(() => uninstall?.());

  it('sends JSON with the session cookie (same origin) and returns the parsed body', async () => {
    const calls = mockApi({ 'POST /things': { status: 201, body: { id: 't1' } } });
    const result = await api.post<{ id: string }>('/things', { name: 'float bowl' });
    expect(result).toEqual({ id: 't1' });
    expect(calls).toHaveLength(1);
    expect(calls[0].init.credentials).toBe('same-origin');
    expect(calls[0].init.body).toBe(JSON.stringify({ name: 'float bowl' }));
    expect((calls[0].init.headers as Record<string, string>)['Content-Type']).toBe('application/json');
  });

  it('turns a 400 into an ApiError carrying the message and the messages of each field', async () => {
    mockApi({
      'POST /auth/sign-up': {
        status: 400,
        body: {
          statusCode: 400,
          error: 'Bad Request',
          message: 'Some fields are not valid.',
          fields: { email: ['Enter a valid e-mail address.'], password: ['Use at least 10 characters.'] },
        },
      },
    });
    const error = await api.post('/auth/sign-up', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(400);
    expect(apiError.message).toBe('Some fields are not valid.');
    expect(apiError.fieldErrors('email')).toEqual(['Enter a valid e-mail address.']);
    expect(apiError.fieldErrors('password')).toEqual(['Use at least 10 characters.']);
    expect(apiError.fieldErrors('displayName')).toEqual([]);
  });

  it('gives a 429 without a body a plain message', async () => {
    mockApi({ 'POST /auth/sign-in': { status: 429 } });
    const error = (await api.post('/auth/sign-in', {}).catch((e: unknown) => e)) as ApiError;
    expect(error.status).toBe(429);
    expect(error.message).toBe(FALLBACK_MESSAGES.tooMany);
  });

  it('reports an unreachable server as status 0 with a connection message', async () => {
    vi.stubGlobal('fetch', vi.fn().mockRejectedValue(new TypeError('Failed to fetch')));
    const error = (await api.get('/health').catch((e: unknown) => e)) as ApiError;
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(0);
    expect(error.message).toBe(FALLBACK_MESSAGES.network);
  });

  it('calls the 401 handler when a call other than the session check and sign-in answers 401', async () => {
    const unauthorized = { statusCode: 401, error: 'Unauthorized', message: 'Sign in first.' };
    mockApi({
      'GET /users': { status: 401, body: unauthorized },
      'GET /auth/me': { status: 401, body: unauthorized },
      'POST /auth/sign-in': { status: 401, body: { ...unauthorized, message: 'E-mail or password is wrong.' } },
    });
    const handler = vi.fn();
    uninstall = setUnauthorizedHandler(handler);

    await expect(api.get('/auth/me')).rejects.toMatchObject({ status: 401 });
    await expect(api.post('/auth/sign-in', {})).rejects.toMatchObject({ status: 401 });
    expect(handler).not.toHaveBeenCalled();

    await expect(api.get('/users')).rejects.toMatchObject({ status: 401, message: 'Sign in first.' });
    expect(handler).toHaveBeenCalledTimes(1);
    expect(handler).toHaveBeenCalledWith({ method: 'GET', path: '/users' });
  });
});
