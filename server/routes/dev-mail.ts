import { Router } from 'express';
import { config } from '@/server/config';
import { ApiError } from '@/server/errors';
import { route } from '@/server/middleware/validate';
import { currentUser, requireRole, requireUser } from '@/server/middleware/auth';
import { clearMail, listMail, readAttachment, readMail, readStoredMail } from '@/server/mail/mail-store';
import { mailAttachmentParamsSchema, mailListQuerySchema, mailParamsSchema } from '@/shared/dev-mail';
import type { User } from '@/server/models';

/** An administrator reads every message; anyone else only those sent to their own address. */
function mayRead(user: User, envelopeTo: readonly string[]): boolean {
  return user.role === 'admin' || envelopeTo.includes(user.email.toLowerCase());
}

/**
 * Development only (never mounted when NODE_ENV=production): read what the
 * local fake SMTP service received, like a mail program would: signed in,
 * an account reads the mail addressed to it (an administrator reads all);
 * signed out, nothing (401). A message to someone else is "not found".
 *   GET    /api/dev/mail?to=           newest first
 *   GET    /api/dev/mail/:id           one message, its links and attachments
 *   GET    /api/dev/mail/:id/attachments/:index
 *   DELETE /api/dev/mail               empty the mailbox (administrators)
 */
export function devMailRoutes() {
  const router = Router();
  router.use(requireUser);
  router.get(
    '/',
    route({ query: mailListQuerySchema }, (req, res) => {
      const user = currentUser(req);
      const { to } = req.query;
      const own = user.email.toLowerCase();
      if (user.role !== 'admin' && to && to !== own) return res.json({ messages: [] });
      res.json({ messages: listMail(config.mailDir, { to: user.role === 'admin' ? to : own }) });
    }),
  );
  router.get(
    '/:id',
    route({ params: mailParamsSchema }, (req, res) => {
      const { id } = req.params;
      const stored = readStoredMail(config.mailDir, id);
      const message = stored && mayRead(currentUser(req), stored.envelopeTo) ? readMail(config.mailDir, id, config.publicUrl) : null;
      if (!message) throw ApiError.notFound('That message');
      res.json({ message });
    }),
  );
  router.get(
    '/:id/attachments/:index',
    route({ params: mailAttachmentParamsSchema }, (req, res) => {
      const { id, index } = req.params;
      const stored = readStoredMail(config.mailDir, id);
      const attachment = stored && mayRead(currentUser(req), stored.envelopeTo) ? readAttachment(config.mailDir, id, index) : null;
      if (!attachment) throw ApiError.notFound('That attachment');
      res.setHeader('Content-Type', attachment.contentType);
      res.setHeader('Content-Disposition', `attachment; filename="${attachment.filename.replace(/[^\w.\- ]/g, '_')}"`);
      res.send(attachment.content);
    }),
  );
  router.delete('/', requireRole('admin'), (_req, res) => {
    res.json({ removed: clearMail(config.mailDir) });
  });
  return router;
}
