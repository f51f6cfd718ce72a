import { useMutation } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import type { BuildInput } from '@/shared/build';
import { predictResponseSchema, type PredictRequest, type PredictResponse } from '@/shared/predict';

/** What usePredict sends: the bow, and a saved build's id or a new build's components (optionally the sight-in to carry it). */
export type PredictVariables = { bowId: number; request: PredictRequest };

/**
 * Predicts a build on a bow (POST /api/bows/:bowId/predict): its speed, and its
 * marks on the bow's fitted sight. A 400 says what is missing (e.g. a second
 * chronographed build).
 * Example: `usePredict().mutate({ bowId: 3, request: { build, sightInId: 12 } })`
 */
export function usePredict() {
  return useMutation<PredictResponse, ApiError, PredictVariables>({
    mutationFn: ({ bowId, request }) =>
      apiFetch(`/api/bows/${bowId}/predict`, { method: 'POST', body: request, schema: predictResponseSchema }),
  });
}

/**
 * The address of a new build's predicted tape (GET /api/bows/:bowId/predict/tape.svg):
 * the build's components, the sight-in and the tape's range and width.
 * Example: predictedTapeHref(3, build, { sightInId: 12, from: 20, to: 80, width: 12 }) → '/api/bows/3/predict/tape.svg?name=…&grainsPerInch=9.3&…'
 */
export function predictedTapeHref(
  bowId: number,
  build: BuildInput,
  options: { sightInId?: number; from: number; to: number; width: number },
): string {
  const query = new URLSearchParams();
  for (const [key, value] of Object.entries(build)) {
    if (value === null || value === undefined || value === '') continue;
    query.set(key, String(value));
  }
  if (options.sightInId !== undefined) query.set('sightInId', String(options.sightInId));
  query.set('from', String(options.from));
  query.set('to', String(options.to));
  query.set('width', String(options.width));
  return `/api/bows/${bowId}/predict/tape.svg?${query.toString()}`;
}
