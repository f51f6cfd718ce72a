import { useMutation } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import { messageResponseSchema, type PasswordForgot, type PasswordReset } from '@/shared/password';

/**
 * Asks for a reset link; the answer is the same whether or not the address has an account.
 * Example: `useForgotPassword().mutate({ email })` → data: 'If an account uses that address, …'
 */
export function useForgotPassword() {
  return useMutation<string, ApiError, PasswordForgot>({
    mutationFn: async (input) =>
      (await apiFetch('/api/password/forgot', { method: 'POST', body: input, schema: messageResponseSchema })).message,
  });
}

/**
 * Sets a new password with the token from the e-mailed link (every session of the account ends).
 * Example: `useResetPassword().mutate({ token, password })`
 */
export function useResetPassword() {
  return useMutation<string, ApiError, PasswordReset>({
    mutationFn: async (input) =>
      (await apiFetch('/api/password/reset', { method: 'POST', body: input, schema: messageResponseSchema })).message,
  });
}
