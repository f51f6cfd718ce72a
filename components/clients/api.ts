import { useQuery } from '@tanstack/react-query';

import { apiFetch, type ApiError } from '@/components/api/client';
import { clientListResponseSchema, type Client } from '@/shared/share';

export const clientKeys = { list: ['clients'] as const };

/**
 * For a technician: the archers who share bows with them, and those bows.
 * Example: `useClients().data?.[0].bows[0].nickname`
 */
export function useClients() {
  return useQuery<Client[], ApiError>({
    queryKey: clientKeys.list,
    queryFn: async () => (await apiFetch('/api/clients', { schema: clientListResponseSchema })).clients,
    staleTime: 0,
  });
}
