import Stripe from 'stripe';

/**
 * The provider's SDK, pointed at its own host or at the one given (the embedded fake, or a
 * provider-compatible endpoint) through the SDK's host/port/protocol options.
 */
export function createPaymentsClient(secretKey: string, apiUrl?: string): Stripe {
  const common = { maxNetworkRetries: 1, timeout: 15_000, telemetry: false };
  if (!apiUrl) return new Stripe(secretKey, common);
  const url = new URL(apiUrl);
  const protocol = url.protocol === 'http:' ? 'http' : 'https';
  return new Stripe(secretKey, { ...common, host: url.hostname, port: Number(url.port || (protocol === 'http' ? 80 : 443)), protocol });
}
