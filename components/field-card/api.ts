import { useQuery } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import { fieldCardResponseSchema, type FieldCardResponse } from '@/shared/field-card';

/** What the field card screen asks for: slopes, slant distances and (optionally) the hunt's air. */
export interface FieldCardParams {
  angles: number[];
  distances: number[];
  altitudeM?: number;
  temperatureC?: number;
}

/**
 * The query string of GET /api/sessions/:id/field-card (and .svg, .pdf).
 * Example: fieldCardQueryString({ angles: [-30, 0, 30], distances: [20, 40], altitudeM: 2700 }) → 'angles=-30%2C0%2C30&distances=20%2C40&altitudeM=2700'
 */
export function fieldCardQueryString(params: FieldCardParams): string {
  const query = new URLSearchParams({ angles: params.angles.join(','), distances: params.distances.join(',') });
  if (params.altitudeM !== undefined) query.set('altitudeM', String(params.altitudeM));
  if (params.temperatureC !== undefined) query.set('temperatureC', String(params.temperatureC));
  return query.toString();
}

/** Query keys: under 'sessions', so a refit (a saved session) refreshes its card. */
export const fieldCardKeys = {
  card: (sessionId: number, query: string) => ['sessions', sessionId, 'field-card', query] as const,
};

/**
 * A session's field card data and words.
 * Example: `const card = useFieldCard(12, { angles: [-30, 0, 30], distances: [20, 40, 60] }); card.data?.card.rows`
 */
export function useFieldCard(sessionId: number, params: FieldCardParams) {
  const query = fieldCardQueryString(params);
  return useQuery<FieldCardResponse, ApiError>({
    queryKey: fieldCardKeys.card(sessionId, query),
    queryFn: () => apiFetch(`/api/sessions/${sessionId}/field-card?${query}`, { schema: fieldCardResponseSchema }),
    enabled: Number.isInteger(sessionId) && sessionId > 0,
    placeholderData: (previous) => previous,
    retry: false,
  });
}
