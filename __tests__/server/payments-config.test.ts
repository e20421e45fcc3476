import { ConfigError, loadConfig } from '../../server/config';

describe('payment provider settings from the environment', () => {
  it('when no PAYMENTS_* variable is set, then the embedded fake provider is used', () => {
    expect(loadConfig({}).payments).toBeUndefined();
  });

  it('when the key and the webhook secret are set, then they are used, with the API address if given', () => {
    expect(loadConfig({ PAYMENTS_SECRET_KEY: 'sk_test_abc', PAYMENTS_WEBHOOK_SECRET: 'whsec_abc' }).payments).toEqual({ secretKey: 'sk_test_abc', webhookSecret: 'whsec_abc', apiUrl: undefined });
    expect(loadConfig({ PAYMENTS_SECRET_KEY: 'sk_test_abc', PAYMENTS_WEBHOOK_SECRET: 'whsec_abc', PAYMENTS_API_URL: 'http://127.0.0.1:12111' }).payments?.apiUrl).toBe('http://127.0.0.1:12111');
  });

  it('when only some are set or a value is malformed, then start-up stops with a message naming them', () => {
    expect(() => loadConfig({ PAYMENTS_SECRET_KEY: 'sk_test_abc' })).toThrow(/PAYMENTS_SECRET_KEY, PAYMENTS_WEBHOOK_SECRET/);
    expect(() => loadConfig({ PAYMENTS_API_URL: 'http://127.0.0.1:12111' })).toThrow(ConfigError);
    expect(() => loadConfig({ PAYMENTS_SECRET_KEY: 'abc', PAYMENTS_WEBHOOK_SECRET: 'whsec_abc' })).toThrow(/PAYMENTS_SECRET_KEY/);
    expect(() => loadConfig({ PAYMENTS_SECRET_KEY: 'sk_test_abc', PAYMENTS_WEBHOOK_SECRET: 'nope' })).toThrow(/PAYMENTS_WEBHOOK_SECRET/);
  });
});
