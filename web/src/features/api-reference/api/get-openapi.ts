import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { OpenApiDescription } from '../utils/openapi';
import { apiReferenceKeys } from './keys';

/** GET /api/openapi.json (staff): the OpenAPI 3.1 description, without the `{ data }` envelope. */
export function getOpenApi(signal?: AbortSignal): Promise<OpenApiDescription> {
  return api.getBare<OpenApiDescription>('/api/openapi.json', signal);
}

export function openApiQueryOptions() {
  return queryOptions({
    queryKey: apiReferenceKeys.description(),
    queryFn: ({ signal }) => getOpenApi(signal),
    // Made from the server's code: it changes only with a new release.
    staleTime: Infinity,
  });
}

export function useOpenApi() {
  return useQuery(openApiQueryOptions());
}
