import { Router } from 'express';
import { config } from '@/server/config';
import { ApiError } from '@/server/errors';
import { validate } from '@/server/middleware/validate';
import { clearMail, listMail, readAttachment, readMail } from '@/server/mail/mail-store';
import { mailAttachmentParamsSchema, mailListQuerySchema, mailParamsSchema } from '@/shared/dev-mail';

/**
 * Development only (never mounted when NODE_ENV=production): read what the
 * local fake SMTP service received. No sign-in, so a reset link can be read
 * while signed out.
 *   GET    /api/dev/mail?to=           newest first
 *   GET    /api/dev/mail/:id           one message, its links and attachments
 *   GET    /api/dev/mail/:id/attachments/:index
 *   DELETE /api/dev/mail               empty the mailbox
 */
export function devMailRoutes() {
  const router = Router();
  router.get('/', validate({ query: mailListQuerySchema }), (req, res) => {
    const { to } = req.query as { to?: string };
    res.json({ messages: listMail(config.mailDir, { to }) });
  });
  router.get('/:id', validate({ params: mailParamsSchema }), (req, res) => {
    const message = readMail(config.mailDir, String(req.params.id), config.publicUrl);
    if (!message) throw ApiError.notFound('That message');
    res.json({ message });
  });
  router.get('/:id/attachments/:index', validate({ params: mailAttachmentParamsSchema }), (req, res) => {
    const { id, index } = req.params as unknown as { id: string; index: number };
    const attachment = readAttachment(config.mailDir, id, index);
    if (!attachment) throw ApiError.notFound('That attachment');
    res.setHeader('Content-Type', attachment.contentType);
    res.setHeader('Content-Disposition', `attachment; filename="${attachment.filename.replace(/[^\w.\- ]/g, '_')}"`);
    res.send(attachment.content);
  });
  router.delete('/', (_req, res) => {
    res.json({ removed: clearMail(config.mailDir) });
  });
  return router;
}
