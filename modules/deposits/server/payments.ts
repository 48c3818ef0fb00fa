import Stripe from 'stripe';

// The payment provider's own SDK, pointed at the local stand-in unless a real API address is given.
export function createStripe(secretKey: string, apiUrl: string | null): Stripe {
  if (!apiUrl) return new Stripe(secretKey, { maxNetworkRetries: 2 });
  const url = new URL(apiUrl);
  return new Stripe(secretKey, {
    host: url.hostname,
    port: Number(url.port || (url.protocol === 'https:' ? 443 : 80)),
    protocol: url.protocol.replace(':', '') as 'http' | 'https',
    maxNetworkRetries: 2,
  });
}
