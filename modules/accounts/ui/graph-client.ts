import { Client, cacheExchange, fetchExchange } from '@urql/core';

interface GraphClientOptions {
  token: string | null;
  /** called when the server refuses the token (expired, or the account was deactivated) */
  onUnauthorized: () => void;
}

/** One client per token, so one user's cached answers never show to the next. */
export function createGraphClient({ token, onUnauthorized }: GraphClientOptions): Client {
  return new Client({
    url: '/graphql',
    preferGetMethod: false,
    exchanges: [cacheExchange, fetchExchange],
    fetchOptions: (): RequestInit => ({ headers: token ? { Authorization: `Bearer ${token}` } : {} }),
    fetch: async (input, init) => {
      const response = await fetch(input, init);
      if (response.status === 401) onUnauthorized();
      return response;
    },
  });
}
