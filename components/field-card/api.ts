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
 * The query string of GET /api/sight-ins/:id/field-card (and .svg, .pdf).
 * Example: fieldCardQueryString({ angles: [-30, 0, 30], distances: [20, 40], altitudeM: 2700 }) → 'angles=-30%2C0%2C30&distances=20%2C40&altitudeM=2700'
 */
export function fieldCardQueryString(params: FieldCardParams): string {
  const query = new URLSearchParams({ angles: params.angles.join(','), distances: params.distances.join(',') });
  if (params.altitudeM !== undefined) query.set('altitudeM', String(params.altitudeM));
  if (params.temperatureC !== undefined) query.set('temperatureC', String(params.temperatureC));
  return query.toString();
}

/** Query keys: under 'sight-ins', so a refit (a saved sight-in) refreshes its card. */
export const fieldCardKeys = {
  card: (sightInId: number, query: string) => ['sightIns', sightInId, 'field-card', query] as const,
};

/**
 * A sight-in's field card data and words.
 * Example: `const card = useFieldCard(12, { angles: [-30, 0, 30], distances: [20, 40, 60] }); card.data?.card.rows`
 */
export function useFieldCard(sightInId: number, params: FieldCardParams) {
  const query = fieldCardQueryString(params);
  return useQuery<FieldCardResponse, ApiError>({
    queryKey: fieldCardKeys.card(sightInId, query),
    queryFn: () => apiFetch(`/api/sight-ins/${sightInId}/field-card?${query}`, { schema: fieldCardResponseSchema }),
    enabled: Number.isInteger(sightInId) && sightInId > 0,
    placeholderData: (previous) => previous,
    retry: false,
  });
}
