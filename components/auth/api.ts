import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, ApiError, isApiError } from '@/components/api/client';
import { userSchema, type ProfileUpdate, type SignInInput, type SignUpInput, type User } from '@/shared/auth';

/** Query keys for the account feature. */
export const authKeys = {
  me: ['me'] as const,
};

const userResponse = z.object({ user: userSchema });

/** Fetches the signed-in user; resolves to null when nobody is signed in (401). */
export async function fetchMe(): Promise<User | null> {
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
    mutationFn: async (input) =>
      (await apiFetch('/api/auth/sign-in', { method: 'POST', body: input, schema: userResponse })).user,
    onSuccess: (user) => {
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
    mutationFn: async (input) =>
      (await apiFetch('/api/auth/sign-up', { method: 'POST', body: input, schema: userResponse })).user,
    onSuccess: (user) => {
      queryClient.setQueryData(authKeys.me, user);
    },
  });
}

/**
 * Signs out and drops every cached record of the previous user.
 * Example: `useSignOut().mutate()`
 */
export function useSignOut() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, void>({
    mutationFn: () => apiFetch<void>('/api/auth/sign-out', { method: 'POST' }),
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
