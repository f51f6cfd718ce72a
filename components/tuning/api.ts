import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { ApiError, apiFetch } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import { levelKeys } from '@/components/level/api';
import { setupEntrySchema, setupListSchema, type SetupEntryInput, type SetupList } from '@/shared/setup-measures';
import {
  paperTuneRunSchema,
  type PaperTuneEnd,
  type PaperTuneRun,
  type PaperTuneShotInput,
  type PaperTuneStart,
} from '@/shared/paper-tune';
import { sightInStalenessSchema, type SightInStaleness } from '@/shared/staleness-api';

/** Query keys of the tuning feature; every key starts with 'tuning'. */
export const tuningKeys = {
  all: ['tuning'] as const,
  setup: (bowId: number) => ['tuning', 'setup', bowId] as const,
  runs: (bowId: number) => ['tuning', 'runs', bowId] as const,
  run: (id: number) => ['tuning', 'run', id] as const,
  staleness: (sightInId: number) => ['tuning', 'staleness', sightInId] as const,
};

const validId = (id: number | undefined): id is number => typeof id === 'number' && Number.isInteger(id) && id > 0;

/** After a tuning write: the tuning records, the level feature (a change makes it due) and every bow (the Bench). */
function refresh(queryClient: QueryClient) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: tuningKeys.all }),
    queryClient.invalidateQueries({ queryKey: levelKeys.all }),
    queryClient.invalidateQueries({ queryKey: bowKeys.all }),
  ]);
}

/** A bow's set-up entries and the latest of each measure. */
export function useSetup(bowId: number | undefined) {
  return useQuery<SetupList, ApiError>({
    queryKey: tuningKeys.setup(bowId ?? 0),
    queryFn: () => apiFetch(`/api/bows/${bowId}/setup`, { schema: setupListSchema }),
    enabled: validId(bowId),
  });
}

/** Adds a set-up entry. Example: `useAddSetupEntry(3).mutate({ measure: 'd-loop', valueMm: 106, … })` */
export function useAddSetupEntry(bowId: number) {
  const queryClient = useQueryClient();
  return useMutation<unknown, ApiError, SetupEntryInput>({
    mutationFn: (input) =>
      apiFetch(`/api/bows/${bowId}/setup`, { method: 'POST', body: input, schema: z.object({ entry: setupEntrySchema }) }),
    onSuccess: () => refresh(queryClient),
  });
}

const runsResponse = z.object({ runs: z.array(paperTuneRunSchema) });
const runResponse = z.object({ run: paperTuneRunSchema });

/** A bow's paper-tune runs, newest first. */
export function useRuns(bowId: number | undefined) {
  return useQuery<PaperTuneRun[], ApiError>({
    queryKey: tuningKeys.runs(bowId ?? 0),
    queryFn: async () => (await apiFetch(`/api/bows/${bowId}/paper-tunes`, { schema: runsResponse })).runs,
    enabled: validId(bowId),
  });
}

/** One paper-tune run with its shots. */
export function useRun(id: number | undefined) {
  return useQuery<PaperTuneRun, ApiError>({
    queryKey: tuningKeys.run(id ?? 0),
    queryFn: async () => (await apiFetch(`/api/paper-tunes/${id}`, { schema: runResponse })).run,
    enabled: validId(id),
  });
}

/** Starts a run; resolves to it. */
export function useStartRun(bowId: number) {
  const queryClient = useQueryClient();
  return useMutation<PaperTuneRun, ApiError, PaperTuneStart>({
    mutationFn: async (input) =>
      (await apiFetch(`/api/bows/${bowId}/paper-tunes`, { method: 'POST', body: input, schema: runResponse })).run,
    onSuccess: (run) => {
      queryClient.setQueryData(tuningKeys.run(run.id), run);
      return refresh(queryClient);
    },
  });
}

/** Adds a shot to a run. */
export function useAddShot(runId: number) {
  const queryClient = useQueryClient();
  return useMutation<PaperTuneRun, ApiError, PaperTuneShotInput>({
    mutationFn: async (input) =>
      (await apiFetch(`/api/paper-tunes/${runId}/shots`, { method: 'POST', body: input, schema: runResponse })).run,
    onSuccess: (run) => {
      queryClient.setQueryData(tuningKeys.run(run.id), run);
      return refresh(queryClient);
    },
  });
}

/** Ends a run: clean, or left for the pro shop. */
export function useEndRun(runId: number) {
  const queryClient = useQueryClient();
  return useMutation<PaperTuneRun, ApiError, PaperTuneEnd>({
    mutationFn: async (input) =>
      (await apiFetch(`/api/paper-tunes/${runId}/end`, { method: 'POST', body: input, schema: runResponse })).run,
    onSuccess: (run) => {
      queryClient.setQueryData(tuningKeys.run(run.id), run);
      return refresh(queryClient);
    },
  });
}

/**
 * Whether a sight-in's marks (and its tapes) must be confirmed at the range.
 * Asked again every time a screen shows it: a change logged anywhere (the
 * level screen, a technician's phone) makes it stale, and a cached "current"
 * must never hide that (the cached answer shows until the new one arrives).
 */
export function useSightInStaleness(sightInId: number | undefined) {
  return useQuery<SightInStaleness, ApiError>({
    queryKey: tuningKeys.staleness(sightInId ?? 0),
    queryFn: () => apiFetch(`/api/sight-ins/${sightInId}/staleness`, { schema: sightInStalenessSchema }),
    enabled: validId(sightInId),
    staleTime: 0,
    refetchOnMount: 'always',
  });
}

/** Records "marks confirmed at the range" on a sight-in. */
export function useConfirmAtRange(sightInId: number) {
  const queryClient = useQueryClient();
  return useMutation<SightInStaleness, ApiError, { note: string }>({
    mutationFn: (input) =>
      apiFetch(`/api/sight-ins/${sightInId}/confirm-range`, { method: 'POST', body: input, schema: sightInStalenessSchema }),
    onSuccess: (result) => {
      queryClient.setQueryData(tuningKeys.staleness(sightInId), result);
      return refresh(queryClient);
    },
  });
}
