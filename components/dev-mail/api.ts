import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { z } from 'zod';

import { apiFetch, type ApiError } from '@/components/api/client';
import { mailMessageSchema, mailSummarySchema, type MailMessage, type MailSummary } from '@/shared/dev-mail';

/** Query keys of the development mail reader. */
export const devMailKeys = {
  all: ['dev-mail'] as const,
  list: ['dev-mail', 'list'] as const,
  message: (id: string) => ['dev-mail', 'message', id] as const,
};

const listResponse = z.object({ messages: z.array(mailSummarySchema) });
const messageResponse = z.object({ message: mailMessageSchema });

/**
 * What the local fake SMTP service received, newest first; refreshed every few seconds.
 * Example: `const mail = useDevMail(); mail.data?.[0].subject`
 */
export function useDevMail() {
  return useQuery<MailSummary[], ApiError>({
    queryKey: devMailKeys.list,
    queryFn: async () => (await apiFetch('/api/dev/mail', { schema: listResponse })).messages,
    refetchInterval: 4000,
    staleTime: 0,
  });
}

/** One received message with its text, links and attachments. Disabled until `id` is set. */
export function useDevMailMessage(id: string | null) {
  return useQuery<MailMessage, ApiError>({
    queryKey: devMailKeys.message(id ?? ''),
    queryFn: async () => (await apiFetch(`/api/dev/mail/${id}`, { schema: messageResponse })).message,
    enabled: Boolean(id),
  });
}

/** Empties the development mailbox. */
export function useClearDevMail() {
  const queryClient = useQueryClient();
  return useMutation<void, ApiError, void>({
    mutationFn: async () => {
      await apiFetch('/api/dev/mail', { method: 'DELETE' });
    },
    onSuccess: () => queryClient.invalidateQueries({ queryKey: devMailKeys.all }),
  });
}
