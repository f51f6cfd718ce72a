import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { accountListResponseSchema, adminAccountSchema, type AccountList, type AccountUpdate, type AdminAccount } from '@/shared/admin';
import { auditListResponseSchema, type AuditList } from '@/shared/audit';
import type { Role } from '@/shared/auth';

/** The administrator's audit filters: one bow, one account, one kind of record. */
export interface AuditFilters {
  bowId?: number;
  accountId?: number;
  kind?: string;
}

export const adminKeys = {
  all: ['admin'] as const,
  accounts: (q: string, role: Role | 'all', page: number) => ['admin', 'accounts', q, role, page] as const,
  audit: (page: number, filters: AuditFilters = {}) => ['admin', 'audit', page, filters] as const,
};

/**
 * The accounts list, searched by name or e-mail, optionally one role.
 * Example: `useAccounts('marit', 'all', 1).data?.accounts`
 */
export function useAccounts(q: string, role: Role | 'all', page: number) {
  const params = new URLSearchParams({ page: String(page) });
  if (q.trim()) params.set('q', q.trim());
  if (role !== 'all') params.set('role', role);
  return useQuery<AccountList, ApiError>({
    queryKey: adminKeys.accounts(q.trim(), role, page),
    queryFn: () => apiFetch(`/api/admin/accounts?${params.toString()}`, { schema: accountListResponseSchema }),
    placeholderData: keepPreviousData,
  });
}

const accountResponse = z.object({ account: adminAccountSchema.partial({ createdAt: true }) });

/** Changes an account's role or disabled state (disabling ends its sign-in sessions). */
export function useUpdateAccount() {
  const queryClient = useQueryClient();
  return useMutation<Partial<AdminAccount>, ApiError, { id: number; update: AccountUpdate }>({
    mutationFn: async ({ id, update }) =>
      (await apiFetch(`/api/admin/accounts/${id}`, { method: 'PATCH', body: update, schema: accountResponse })).account,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: adminKeys.all }),
  });
}

/** The whole audit log, newest first, 50 a page; narrowed by bow, account and kind when given. */
export function useAdminAudit(page: number, filters: AuditFilters = {}) {
  const params = new URLSearchParams({ page: String(page) });
  if (filters.bowId) params.set('bowId', String(filters.bowId));
  if (filters.accountId) params.set('accountId', String(filters.accountId));
  if (filters.kind) params.set('kind', filters.kind);
  return useQuery<AuditList, ApiError>({
    queryKey: adminKeys.audit(page, filters),
    queryFn: () => apiFetch(`/api/admin/audit?${params.toString()}`, { schema: auditListResponseSchema }),
    placeholderData: keepPreviousData,
  });
}
