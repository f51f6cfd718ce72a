import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, ApiError, isApiError } from '@/components/api/client';
import { isOnline } from '@/components/offline/connectivity';
import { clearOutbox } from '@/components/offline/outbox';
import { forgetDeviceCache } from '@/components/offline/query-persistence';
import { signedInUserId } from '@/components/offline/send-or-keep';
import { userSchema, type ProfileUpdate, type SignInInput, type SignUpInput, type User } from '@/shared/auth';

/** Query keys for the account feature. */
export const authKeys = {
  me: ['me'] as const,
};

const userResponse = z.object({ user: userSchema });

/**
 * A sign-out made with no signal: the server's sign-in session is ended at the next
 * chance (before anyone is taken as signed in), so a shared phone never
 * signs the last archer back in. Kept in localStorage (read synchronously).
 */
const pendingSignOutKey = 'pinwright-sign-out-pending';
const storage = () => (typeof localStorage === 'undefined' ? null : localStorage);

/** Ends the server's sign-in session left from an offline sign-out; true when none is left. */
async function finishPendingSignOut(): Promise<boolean> {
  if (storage()?.getItem(pendingSignOutKey) !== '1') return true;
  try {
    await apiFetch<void>('/api/auth/sign-out', { method: 'POST' });
    storage()?.removeItem(pendingSignOutKey);
    return true;
  } catch {
    return false;
  }
}

/** Fetches the signed-in user; resolves to null when nobody is signed in (401) or a sign-out made offline is still to reach the server. */
export async function fetchMe(): Promise<User | null> {
  if (!(await finishPendingSignOut())) return null;
  try {
    const { user } = await apiFetch('/api/me', { schema: userResponse });
    return user;
  } catch (error) {
    if (isApiError(error, 401)) return null;
    throw error;
  }
}

/**
 * The signed-in user: `data` is the User, or null when signed out.
 * Example: `const me = useMe(); if (me.data === null) return <Redirect href="/sign-in" />;`
 */
export function useMe() {
  return useQuery<User | null, ApiError>({
    queryKey: authKeys.me,
    queryFn: fetchMe,
    staleTime: 5 * 60_000,
  });
}

/**
 * Signs in; on success the user becomes the `useMe` value.
 * Example: `useSignIn().mutate({ email, password })`
 */
export function useSignIn() {
  const queryClient = useQueryClient();
  return useMutation<User, ApiError, SignInInput>({
    mutationFn: async (input) => (await apiFetch('/api/auth/sign-in', { method: 'POST', body: input, schema: userResponse })).user,
    onSuccess: (user) => {
      // A new sign-in replaces the sign-in session an offline sign-out meant to end.
      storage()?.removeItem(pendingSignOutKey);
      queryClient.setQueryData(authKeys.me, user);
    },
  });
}

/**
 * Creates an account and signs it in; on success the user becomes the `useMe` value.
 * Example: `useSignUp().mutate({ name, email, password })`
 */
export function useSignUp() {
  const queryClient = useQueryClient();
  return useMutation<User, ApiError, SignUpInput>({
    mutationFn: async (input) => (await apiFetch('/api/auth/sign-up', { method: 'POST', body: input, schema: userResponse })).user,
    onSuccess: (user) => {
      // A new sign-in replaces the sign-in session an offline sign-out meant to end.
      storage()?.removeItem(pendingSignOutKey);
      queryClient.setQueryData(authKeys.me, user);
    },
  });
}

/**
 * Signs out and drops every record of the previous user, in memory and on the
 * device (its cache and its outbox: a shared phone must not show the last
 * archer's bows). With no signal it signs out on the phone at once and ends
 * the server's sign-in session when the signal is back.
 * Example: `useSignOut().mutate()`
 */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, void>({
    mutationFn: async () => {
      const userId = signedInUserId(queryClient);
      let reached = false;
      if (isOnline()) {
        try {
          await apiFetch<void>('/api/auth/sign-out', { method: 'POST' });
          reached = true;
        } catch (error) {
          if (!isApiError(error) || error.status !== 0) throw error;
        }
      }
      if (!reached) storage()?.setItem(pendingSignOutKey, '1');
      await forgetDeviceCache(userId);
      if (userId !== null) await clearOutbox(userId);
    },
    onSuccess: () => {
      queryClient.removeQueries({ predicate: (query) => query.queryKey[0] !== authKeys.me[0] });
      queryClient.setQueryData(authKeys.me, null);
    },
  });
}

/**
 * Changes the signed-in user's name or preferred units; the result becomes the `useMe` value.
 * Example: `useUpdateProfile().mutate({ distanceUnit: 'm' })`
 */
export function useUpdateProfile() {
  const queryClient = useQueryClient();
  return useMutation<User, ApiError, ProfileUpdate>({
    mutationFn: async (input) => (await apiFetch('/api/me', { method: 'PATCH', body: input, schema: userResponse })).user,
    onSuccess: (user) => {
      queryClient.setQueryData(authKeys.me, user);
      // Screens show lengths and distances in these units: refetch what they show.
      queryClient.invalidateQueries({ predicate: (q) => q.queryKey[0] !== authKeys.me[0] });
    },
  });
}
