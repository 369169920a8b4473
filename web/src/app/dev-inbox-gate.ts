import { data } from 'react-router';
import { isApiError } from '../lib/api-client';

/**
 * The loader of /dev/inbox, given the inbox's own list query. The page exists only where its API
 * does (demo mode, a client on this machine: api/src/middleware/dev-inbox.ts decides); anywhere
 * else the API answers 404 and so does this route, before the inbox is drawn. The server does not
 * serve the page there either.
 */
export function devInboxLoader(fetchList: () => Promise<unknown>): () => Promise<null> {
  return async () => {
    try {
      await fetchList();
    } catch (error) {
      if (isApiError(error) && error.status === 404) throw data('No such page.', { status: 404 });
      throw error;
    }
    return null;
  };
}
