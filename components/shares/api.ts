import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { authKeys } from '@/components/auth/api';
import { userSchema, type User } from '@/shared/auth';
import { auditListResponseSchema, type AuditList } from '@/shared/audit';
import {
  invitePreviewResponseSchema,
  shareListResponseSchema,
  shareResponseSchema,
  type InvitePreview,
  type InviteSignUp,
  type Share,
} from '@/shared/share';

/** Query keys for sharing; every key starts with 'shares'. */
export const shareKeys = {
  all: ['shares'] as const,
  bow: (bowId: number) => ['shares', 'bow', bowId] as const,
  mine: ['shares', 'mine'] as const,
  audit: (bowId: number) => ['shares', 'audit', bowId] as const,
  invite: (token: string) => ['shares', 'invite', token] as const,
};

/**
 * The shares of one bow (for its archer), newest first.
 * Example: `useBowShares(3).data?.filter((s) => s.state === 'active')`
 */
export function useBowShares(bowId: number, enabled = true) {
  return useQuery<Share[], ApiError>({
    queryKey: shareKeys.bow(bowId),
    enabled,
    queryFn: async () => (await apiFetch(`/api/bows/${bowId}/shares`, { schema: shareListResponseSchema })).shares,
  });
}

/** The open shares of all the archer's bows (Account page). */
export function useMyShares(enabled = true) {
  return useQuery<Share[], ApiError>({
    queryKey: shareKeys.mine,
    enabled,
    queryFn: async () => (await apiFetch('/api/shares', { schema: shareListResponseSchema })).shares,
  });
}

/** The bow's audit log, newest first (for its archer). */
export function useBowAudit(bowId: number, enabled = true) {
  return useQuery<AuditList, ApiError>({
    queryKey: shareKeys.audit(bowId),
    enabled,
    queryFn: () => apiFetch(`/api/bows/${bowId}/audit`, { schema: auditListResponseSchema }),
  });
}

/**
 * Invites a technician by e-mail (or sends a fresh link to an invited one).
 * Example: `useInviteTech(3).mutate({ email: 'desmond@example.test' })`
 */
export function useInviteTech(bowId: number) {
  const queryClient = useQueryClient();
  return useMutation<Share, ApiError, { email: string }>({
    mutationFn: async (input) =>
      (await apiFetch(`/api/bows/${bowId}/shares`, { method: 'POST', body: input, schema: shareResponseSchema })).share,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.all }),
  });
}

/** Ends a share at once. */
export function useRevokeShare() {
  const queryClient = useQueryClient();
  return useMutation<Share, ApiError, number>({
    mutationFn: async (shareId) => (await apiFetch(`/api/shares/${shareId}/revoke`, { method: 'POST', schema: shareResponseSchema })).share,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: shareKeys.all }),
  });
}

/** What an invitation link is for (no sign-in needed). Disabled without a token. */
export function useInvitePreview(token: string | undefined) {
  return useQuery<InvitePreview, ApiError>({
    queryKey: shareKeys.invite(token ?? ''),
    queryFn: async () => (await apiFetch(`/api/invites/${token}`, { schema: invitePreviewResponseSchema })).invite,
    enabled: Boolean(token),
    retry: false,
  });
}

/** Accepts an invitation, signed in as a technician. */
export function useAcceptInvite() {
  const queryClient = useQueryClient();
  return useMutation<Share, ApiError, string>({
    mutationFn: async (token) =>
      (await apiFetch('/api/invites/accept', { method: 'POST', body: { token }, schema: shareResponseSchema })).share,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: ['clients'] }),
  });
}

const acceptNewResponse = z.object({ user: userSchema, share: shareResponseSchema.shape.share });

/** Creates a technician account for the invited address and accepts; the new account is signed in. */
export function useAcceptWithNewAccount() {
  const queryClient = useQueryClient();
  return useMutation<{ user: User; share: Share }, ApiError, InviteSignUp>({
    mutationFn: (input) => apiFetch('/api/invites/accept-new', { method: 'POST', body: input, schema: acceptNewResponse }),
    onSuccess: ({ user }) => {
      queryClient.setQueryData(authKeys.me, user);
    },
  });
}
