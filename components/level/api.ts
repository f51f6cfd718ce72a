import { useMutation, useQuery, useQueryClient, type QueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { ApiError, apiFetch } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import { sendOrKeep } from '@/components/offline/send-or-keep';
import {
  changeListResponseSchema,
  changeResponseSchema,
  checkListResponseSchema,
  checkResponseSchema,
  levelSummarySchema,
  photoResponseSchema,
  tripReadinessSchema,
  type BowChange,
  type BowChangeInput,
  type CheckUpdate,
  type LevelCheck,
  type LevelPlace,
  type LevelStepKey,
  type LevelSummary,
  type Photo,
  type TripReadiness,
} from '@/shared/level';

/** Query keys of the level feature; every key starts with 'level'. */
export const levelKeys = {
  all: ['level'] as const,
  summary: (bowId: number) => ['level', 'summary', bowId] as const,
  checks: (bowId: number) => ['level', 'checks', bowId] as const,
  check: (id: number) => ['level', 'check', id] as const,
  changes: (bowId: number) => ['level', 'changes', bowId] as const,
  readiness: (bowId: number) => ['level', 'readiness', bowId] as const,
};

const validId = (id: number | undefined): id is number => typeof id === 'number' && Number.isInteger(id) && id > 0;

/** After any level write: refresh the level feature and every bow (the Bench shows the level state). */
function refreshAfterWrite(queryClient: QueryClient) {
  return Promise.all([
    queryClient.invalidateQueries({ queryKey: levelKeys.all }),
    queryClient.invalidateQueries({ queryKey: bowKeys.all }),
  ]);
}

/**
 * A bow's level state and why.
 * Example: `const level = useLevel(3); level.data?.state` → 'due'
 */
export function useLevel(bowId: number | undefined) {
  return useQuery<LevelSummary, ApiError>({
    queryKey: levelKeys.summary(bowId ?? 0),
    queryFn: () => apiFetch(`/api/bows/${bowId}/level`, { schema: levelSummarySchema }),
    enabled: validId(bowId),
  });
}

/** A bow's level checks, newest first (open ones included). */
export function useChecks(bowId: number | undefined) {
  return useQuery<LevelCheck[], ApiError>({
    queryKey: levelKeys.checks(bowId ?? 0),
    queryFn: async () => (await apiFetch(`/api/bows/${bowId}/checks`, { schema: checkListResponseSchema })).checks,
    enabled: validId(bowId),
  });
}

/** One level check with its steps (for resuming or reading back). */
export function useCheck(id: number | undefined) {
  return useQuery<LevelCheck, ApiError>({
    queryKey: levelKeys.check(id ?? 0),
    queryFn: async () => (await apiFetch(`/api/checks/${id}`, { schema: checkResponseSchema })).check,
    enabled: validId(id),
  });
}

/**
 * Starts a check on the bow; resolves to the new check.
 * Example: `useStartCheck(3).mutate('bench', { onSuccess: (check) => router.push(`/checks/${check.id}`) })`
 */
export function useStartCheck(bowId: number) {
  const queryClient = useQueryClient();
  return useMutation<LevelCheck, ApiError, LevelPlace>({
    mutationFn: async (place) =>
      (await apiFetch(`/api/bows/${bowId}/checks`, { method: 'POST', body: { place }, schema: checkResponseSchema })).check,
    onSuccess: (check) => {
      queryClient.setQueryData(levelKeys.check(check.id), check);
      return refreshAfterWrite(queryClient);
    },
  });
}

/**
 * The check as it will be once `update` is applied, for a save kept on the
 * phone with no signal (the server applies the same when it is sent).
 * Example: withUpdate(check, { steps: [{ step: 'setup', result: 'pass', reading: null, readingUnit: null, adjustment: '' }] }).steps[0].result → 'pass'
 */
export function withUpdate(check: LevelCheck, update: CheckUpdate, now = new Date().toISOString()): LevelCheck {
  const steps = check.steps.map((step) => {
    const entry = update.steps?.find((item) => item.step === step.step);
    return entry
      ? {
          ...step,
          result: entry.result ?? step.result,
          reading: entry.reading ?? null,
          readingUnit: entry.readingUnit ?? null,
          adjustment: entry.adjustment ?? '',
          updatedAt: now,
        }
      : step;
  });
  return {
    ...check,
    steps,
    note: update.note ?? check.note,
    place: update.place ?? check.place,
    ...(update.complete ? { status: 'complete' as const, completedAt: now } : {}),
  };
}

/**
 * Saves step results / note / completion of a check (PATCH /api/checks/:id),
 * with an idempotency key. With no signal the save is kept on the phone
 * (components/offline) and the check is updated in place, so the archer goes
 * on to the next step; it is sent in order when the signal is back.
 * Example: `useSaveCheck(12).mutate({ steps: [{ step: 'setup', result: 'pass', … }] })`
 */
export function useSaveCheck(id: number) {
  const queryClient = useQueryClient();
  return useMutation<LevelCheck, ApiError, CheckUpdate>({
    mutationFn: async (update) => {
      const cached = queryClient.getQueryData<LevelCheck>(levelKeys.check(id));
      const steps = update.steps?.map((step) => step.step).join(', ');
      const result = await sendOrKeep(
        queryClient,
        {
          kind: 'check-steps',
          title: update.complete ? 'Level check completed' : `Level check: ${steps ? `step ${steps}` : 'note'}`,
          method: 'PATCH',
          path: `/api/checks/${id}`,
          body: update,
          bowId: cached?.bowId ?? null,
          recordId: id,
        },
        checkResponseSchema,
      );
      if (!result.kept) return result.data.check;
      if (!cached) throw new ApiError(0, 'network', 'Kept on this phone; it is sent when the signal is back.');
      return withUpdate(cached, update);
    },
    onSuccess: (check) => {
      queryClient.setQueryData(levelKeys.check(check.id), check);
      return refreshAfterWrite(queryClient);
    },
  });
}

/** Discards an open check. */
export function useDiscardCheck() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, number>({
    mutationFn: (id) => apiFetch<void>(`/api/checks/${id}`, { method: 'DELETE' }),
    onSuccess: (_nothing, id) => {
      queryClient.removeQueries({ queryKey: levelKeys.check(id) });
      return refreshAfterWrite(queryClient);
    },
  });
}

/** A bow's change log, newest first. */
export function useChanges(bowId: number | undefined) {
  return useQuery<BowChange[], ApiError>({
    queryKey: levelKeys.changes(bowId ?? 0),
    queryFn: async () => (await apiFetch(`/api/bows/${bowId}/changes`, { schema: changeListResponseSchema })).changes,
    enabled: validId(bowId),
  });
}

/**
 * Logs a change on the bow, with an idempotency key; resolves to the change
 * and the bow's new level state. With no signal the change is kept on the
 * phone (components/offline) and the level shown as due until it is sent.
 * Example: `useLogChange(3).mutate({ kind: 'string', changedAt: new Date().toISOString(), note: '' })`
 */
export function useLogChange(bowId: number) {
  const queryClient = useQueryClient();
  return useMutation<z.infer<typeof changeResponseSchema>, ApiError, BowChangeInput>({
    mutationFn: async (input) => {
      const result = await sendOrKeep(
        queryClient,
        {
          kind: 'change',
          title: `Change logged: ${input.kind}`,
          method: 'POST',
          path: `/api/bows/${bowId}/changes`,
          body: input,
          bowId,
          recordId: null,
        },
        changeResponseSchema,
      );
      if (!result.kept) return result.data;
      const me = queryClient.getQueryData<{ id: number; name: string }>(['me']);
      const summary = queryClient.getQueryData<LevelSummary>(levelKeys.summary(bowId));
      const now = new Date().toISOString();
      const change = {
        id: 0,
        bowId,
        kind: input.kind,
        changedAt: input.changedAt,
        note: input.note ?? '',
        loggedBy: { id: me?.id ?? 0, name: me?.name ?? '' },
        createdAt: now,
      };
      const reason = 'A change is kept on this phone, not sent yet: check the level once it is sent.';
      const level: LevelSummary = summary
        ? { ...summary, state: summary.state === 'verified' ? 'due' : summary.state, reason }
        : {
            state: 'due',
            reason,
            lastCheck: null,
            changesSince: [],
            openCheckId: null,
            ageDays: null,
            maxAgeDays: 0,
            rangeConfirmed: false,
          };
      return { change, level };
    },
    onSuccess: (result) => {
      queryClient.setQueryData(levelKeys.summary(bowId), result.level);
      return refreshAfterWrite(queryClient);
    },
  });
}

/** Deletes a change the user logged. */
export function useDeleteChange() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, number>({
    mutationFn: (id) => apiFetch<void>(`/api/changes/${id}`, { method: 'DELETE' }),
    onSuccess: () => refreshAfterWrite(queryClient),
  });
}

/** The before-a-trip summary of a bow. */
export function useReadiness(bowId: number | undefined) {
  return useQuery<TripReadiness, ApiError>({
    queryKey: levelKeys.readiness(bowId ?? 0),
    queryFn: () => apiFetch(`/api/bows/${bowId}/readiness`, { schema: tripReadinessSchema }),
    enabled: validId(bowId),
    staleTime: 0,
  });
}

/**
 * Uploads a step's photo as multipart form data through apiFetch (CSRF header,
 * the server's error shape as an ApiError); the server's limit is 5 MB.
 * Example: `await uploadStepPhoto(12, 'second-axis', file)` → { id, url, mimeType, sizeBytes }
 */
export async function uploadStepPhoto(checkId: number, step: LevelStepKey, file: Blob, fileName = 'photo'): Promise<Photo> {
  const body = new FormData();
  body.append('photo', file, fileName);
  try {
    const answer = await apiFetch(`/api/checks/${checkId}/steps/${step}/photo`, { method: 'POST', body, schema: photoResponseSchema });
    return answer.photo;
  } catch (error) {
    // A proxy may refuse a large body before the server can answer in its own words.
    if (error instanceof ApiError && error.status === 413 && error.code === 'too_large') {
      throw new ApiError(413, 'too_large', 'The photo is larger than 5 MB.');
    }
    throw error;
  }
}

/** Uploads (or replaces) a step's photo and refreshes the check. */
export function useUploadStepPhoto(checkId: number) {
  const queryClient = useQueryClient();
  return useMutation<Photo, ApiError, { step: LevelStepKey; file: Blob; fileName?: string }>({
    mutationFn: ({ step, file, fileName }) => uploadStepPhoto(checkId, step, file, fileName),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: levelKeys.check(checkId) }),
  });
}

/** Removes a step's photo. */
export function useRemoveStepPhoto(checkId: number) {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, LevelStepKey>({
    mutationFn: (step) => apiFetch<void>(`/api/checks/${checkId}/steps/${step}/photo`, { method: 'DELETE' }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: levelKeys.check(checkId) }),
  });
}
