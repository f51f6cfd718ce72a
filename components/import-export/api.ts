import { useMutation, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { bowKeys } from '@/components/bows/api';
import { sightInKeys } from '@/components/sight-ins/api';
import { importResultSchema, type ImportResult, type MarkImport } from '@/shared/csv';
import type { SendTape } from '@/shared/export';

/** Addresses of a bow's exports (downloads, not JSON API calls). */
export const exportPaths = {
  csv: (bowId: number) => `/api/bows/${bowId}/export.csv`,
  json: (bowId: number) => `/api/bows/${bowId}/export.json`,
};

/**
 * Checks a CSV file of marks row by row; nothing is saved.
 * Example: `usePreviewImport(9).mutate({ csv, unit: 'yd' })` → data.rows[0].problems
 */
export function usePreviewImport(sightInId: number) {
  return useMutation<ImportResult, ApiError, MarkImport>({
    mutationFn: (input) =>
      apiFetch(`/api/sight-ins/${sightInId}/marks/import?dryRun=1`, { method: 'POST', body: input, schema: importResultSchema }),
  });
}

/** Adds the file's marks to the sight-in, all or nothing; refreshes the sight-in and its bow. */
export function useImportMarks(sightInId: number) {
  const queryClient = useQueryClient();
  return useMutation<ImportResult, ApiError, MarkImport>({
    mutationFn: (input) =>
      apiFetch(`/api/sight-ins/${sightInId}/marks/import`, { method: 'POST', body: input, schema: importResultSchema }),
    onSuccess: () => {
      queryClient.invalidateQueries({ queryKey: sightInKeys.all });
      queryClient.invalidateQueries({ queryKey: bowKeys.all });
    },
  });
}

const messageResponse = z.object({ message: z.string() });

/** E-mails the sight-in's print sheet as a PDF. */
export function useSendTape(sightInId: number) {
  return useMutation<string, ApiError, SendTape>({
    mutationFn: async (input) =>
      (await apiFetch(`/api/sight-ins/${sightInId}/send-tape`, { method: 'POST', body: input, schema: messageResponse })).message,
  });
}
