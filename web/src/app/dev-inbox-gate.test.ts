import { createMemoryRouter, isRouteErrorResponse } from 'react-router';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { api } from '../lib/api-client';
import { devInboxLoader } from './dev-inbox-gate';

function answer(status: number, body: unknown) {
  vi.stubGlobal(
    'fetch',
    vi.fn(async () => new Response(JSON.stringify(body), { status })),
  );
}

afterEach(() => vi.unstubAllGlobals());

// The real API client against a stubbed network: what GET /api/dev/mail answers decides.
const loader = devInboxLoader(() => api.get('/api/dev/mail'));

describe('devInboxLoader', () => {
  it('lets the page load where the demo inbox API answers', async () => {
    answer(200, { data: [] });
    await expect(loader()).resolves.toBeNull();
  });

  it('answers the route with a 404 where the API does not exist (not demo mode, not this machine)', async () => {
    answer(404, { error: { code: 'not_found', message: 'No such API route.' } });
    // Through a real router, as the app's: the route ends in its error boundary with a 404.
    const router = createMemoryRouter([{ id: 'inbox', path: '/dev/inbox', loader, element: null }], {
      initialEntries: ['/dev/inbox'],
    });
    await new Promise<void>((resolve) => {
      if (router.state.initialized) resolve();
      else router.subscribe((state) => state.initialized && resolve());
    });
    const error = router.state.errors?.inbox;
    expect(isRouteErrorResponse(error)).toBe(true);
    expect(error).toMatchObject({ status: 404 });
    router.dispose();
  });

  it('lets any other failure through to the error page', async () => {
    answer(500, { error: { code: 'internal_error', message: 'Boom' } });
    await expect(loader()).rejects.toMatchObject({ status: 500 });
  });
});
