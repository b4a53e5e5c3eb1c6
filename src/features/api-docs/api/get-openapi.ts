import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client.ts';
import type { OpenApiDoc } from '../openapi-types.ts';

const openApiQuery = queryOptions({
  queryKey: ['openapi'],
  queryFn: ({ signal }) => api.get<OpenApiDoc>('/api/openapi.json', { signal }),
  staleTime: 5 * 60_000,
});

/** The API's OpenAPI document, as the server builds it from its route table. */
export const useOpenApi = () => useQuery(openApiQuery);
