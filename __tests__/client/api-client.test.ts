import { api, ApiError, messageOf } from '../../hooks/api-client';

function respond(status: number, body?: unknown) {
  global.fetch = jest.fn().mockResolvedValue({
    ok: status >= 200 && status < 300,
    status,
    text: async () => (body === undefined ? '' : JSON.stringify(body)),
  }) as unknown as typeof fetch;
}

async function failureOf(promise: Promise<unknown>): Promise<ApiError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ApiError) return error;
  }
  throw new Error('expected an ApiError');
}

describe('api client', () => {
  it('when the request succeeds, then it sends cookies and returns the JSON body', async () => {
    respond(200, { user: { id: '1' } });

    await expect(api.get('/auth/me')).resolves.toEqual({ user: { id: '1' } });
    expect(global.fetch).toHaveBeenCalledWith('/api/auth/me', expect.objectContaining({ credentials: 'include' }));
  });

  it.each([
    [401, 'signed_out'],
    [403, 'forbidden'],
    [404, 'not_found'],
    [409, 'conflict'],
    [429, 'rate_limited'],
    [500, 'server'],
  ])('when the server answers %i, then the failure is %s with the server message', async (status, kind) => {
    respond(status, { error: { code: 'some_code', message: 'For a person' } });

    const error = await failureOf(api.get('/x'));
    expect(error.kind).toBe(kind);
    expect(error.message).toBe('For a person');
    expect(error.code).toBe('some_code');
  });

  it('when a body is invalid, then the field messages come through', async () => {
    respond(409, { error: { code: 'email_taken', message: 'Taken', fields: { email: 'Already in use' } } });

    const error = await failureOf(api.post('/users', {}));
    expect(error.fields).toEqual({ email: 'Already in use' });
  });

  it('when the server sends the message as words, then it reads in the reader’s units (a 380 °C excess is 684 °F, NIST SP 811 §4.2.1.1)', async () => {
    const words = ['Over its limit by ', { kind: 'temperatureDelta', si: 380 }, '.'];
    respond(409, { error: { code: 'limit_override_needed', message: 'Over its limit by 380 °C.', words } });

    const error = await failureOf(api.post('/quotes/q1/send', {}));
    expect(messageOf(error, 'imperial')).toBe('Over its limit by 684 °F.');
    expect(messageOf(error)).toBe('Over its limit by 380 °C.');
  });

  it('when the network is down, then the failure is offline', async () => {
    global.fetch = jest.fn().mockRejectedValue(new TypeError('Failed to fetch')) as unknown as typeof fetch;

    expect((await failureOf(api.get('/x'))).kind).toBe('offline');
  });

  it('when the server answers without the error shape, then a readable fallback message is used', async () => {
    respond(502);

    const error = await failureOf(api.get('/x'));
    expect(error.kind).toBe('server');
    expect(error.message).toMatch(/server/);
  });
});
