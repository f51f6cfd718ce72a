import { useMutation, useQueryClient } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import { authKeys } from '@/components/auth/api';
import { accountDeletedSchema, passwordChangedSchema, type AccountDelete, type PasswordChange } from '@/shared/account';

/**
 * Changes the password; the server ends the account's other sign-ins and keeps this one.
 * Example: `useChangePassword().mutate({ currentPassword, newPassword })`
 */
export function useChangePassword() {
  return useMutation<{ message: string; endedSessions: number }, ApiError, PasswordChange>({
    mutationFn: (input) => apiFetch('/api/me/password', { method: 'POST', body: input, schema: passwordChangedSchema }),
  });
}

/**
 * Deletes the account and everything in it after its password; on success
 * nobody is signed in here any more (the signed-in layout then leaves for sign-in).
 * Example: `useDeleteAccount().mutate({ password })`
 */
export function useDeleteAccount() {
  const queryClient = useQueryClient();
  return useMutation<{ message: string }, ApiError, AccountDelete>({
    mutationFn: (input) => apiFetch('/api/me/delete', { method: 'POST', body: input, schema: accountDeletedSchema }),
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.me[0] });
      queryClient.setQueryData(authKeys.me, null);
    },
  });
}

/** Where the whole account downloads as one JSON file. */
export const accountExportHref = '/api/me/export.json';
