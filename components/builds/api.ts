import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowKeys, fetchBow } from '@/components/bows/api';
import type { BowDetail } from '@/shared/bow-detail';
import { buildSchema, type Build, type BuildInput } from '@/shared/build';

/** Query keys for arrow builds. */
export const buildKeys = {
  all: ['builds'] as const,
  detail: (id: number) => ['builds', id] as const,
};

const buildResponse = z.object({ build: buildSchema });

/** GET /api/builds/:id */
export async function fetchBuild(id: number): Promise<Build> {
  const { build } = await apiFetch(`/api/builds/${id}`, { schema: buildResponse });
  return build;
}

/**
 * One arrow build (with its derived totals). Disabled until `id` is a number.
 * Example: `const build = useBuild(7); build.data?.derived.totalGr`
 */
export function useBuild(id: number | undefined) {
  return useQuery<Build, ApiError>({
    queryKey: buildKeys.detail(id ?? 0),
    queryFn: () => fetchBuild(id as number),
    enabled: typeof id === 'number' && Number.isInteger(id) && id > 0,
  });
}

/**
 * A bow's builds, newest first as the server sends them. They come with the
 * bow's detail (GET /api/bows/:id), so this shares useBow's cache entry.
 * Example: `useBuilds(3).data?.map((build) => build.name)`
 */
export function useBuilds(bowId: number | undefined) {
  return useQuery<BowDetail, ApiError, Build[]>({
    queryKey: bowKeys.detail(bowId ?? 0),
    queryFn: () => fetchBow(bowId as number),
    enabled: typeof bowId === 'number' && Number.isInteger(bowId) && bowId > 0,
    select: (bow) => bow.builds,
  });
}

/** A new build for a bow (bowId) or the whole edited build (id). */
export type SaveBuildVariables = { id?: number; bowId?: number; input: BuildInput };

/**
 * Creates (POST /api/bows/:bowId/builds) or updates (PATCH /api/builds/:id) a build,
 * then refreshes the build and its bow.
 * Example: `useSaveBuild().mutate({ bowId: 3, input })`
 */
export function useSaveBuild() {
  const queryClient = useQueryClient();
  return useMutation<Build, ApiError, SaveBuildVariables>({
    mutationFn: async ({ id, bowId, input }) => {
      const path = id ? `/api/builds/${id}` : `/api/bows/${bowId}/builds`;
      const { build } = await apiFetch(path, { method: id ? 'PATCH' : 'POST', body: input, schema: buildResponse });
      return build;
    },
    onSuccess: (build) => {
      queryClient.setQueryData(buildKeys.detail(build.id), build);
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}

/**
 * Deletes a build (DELETE /api/builds/:id); the server refuses one that sight-ins use.
 * Example: `useDeleteBuild().mutate(build)`
 */
export function useDeleteBuild() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, Pick<Build, 'id' | 'bowId'>>({
    mutationFn: ({ id }) => apiFetch<void>(`/api/builds/${id}`, { method: 'DELETE' }),
    onSuccess: (_, build) => {
      queryClient.removeQueries({ queryKey: buildKeys.detail(build.id) });
      return queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}
