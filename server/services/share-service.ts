/**
 * Sharing one bow with a technician. The archer enters the technician's
 * e-mail address; the share starts `invited` and an e-mail with a single-use
 * link (valid 7 days, token stored as its SHA-256) is sent. Accepting the link
 * — signed in as a technician with that address, or creating such an account
 * on the spot — makes the share `active`. The archer can revoke it at any
 * time; access is checked on every request (bow-access.ts), so the next
 * request of the technician is refused.
 *
 * Example: await inviteTech(marit, 12, 'desmond@example.test')  → { state: 'invited', … } and an e-mail
 *          await acceptInvite(desmond, token)                     → { state: 'active', … }
 */
import { Op } from 'sequelize';
import { config } from '@/server/config';
import { sequelize } from '@/server/db';
import { ApiError } from '@/server/errors';
import { inviteMessage } from '@/server/mail/messages';
import { Bow, Share, Token, User } from '@/server/models';
import { recordAudit } from '@/server/services/audit-service';
import { signUp } from '@/server/services/auth-service';
import { bowFor } from '@/server/services/bow-access';
import { sendMail } from '@/server/services/mail-service';
import { checkToken, consumeToken, issueToken, retireTokens, tokenError, type TokenProblem } from '@/server/services/token-service';
import { inviteValidDays, type Client, type InvitePreview, type InviteSignUp, type Share as ShareJson } from '@/shared/share';

const inviteValidMs = inviteValidDays * 24 * 3600 * 1000;

const linkWords: Record<TokenProblem, string> = {
  unknown: 'This invitation link is not valid. Ask the archer to send a new one.',
  used: 'This invitation has already been accepted. Sign in to see the bow under Clients.',
  expired: `This invitation link has expired (links work for ${inviteValidDays} days, and a newer invitation replaces an older one). Ask the archer to send a new one.`,
};

/** The address of the accept page for a token. */
export function inviteLink(raw: string): string {
  return `${config.publicUrl.replace(/\/+$/, '')}/invite?token=${raw}`;
}

const shareIncludes = [
  { model: User, as: 'tech', attributes: ['id', 'name', 'email'] },
  { model: Bow, as: 'bow', attributes: ['id', 'nickname'] },
];

async function shareJson(share: Share): Promise<ShareJson> {
  const newest =
    share.state === 'invited'
      ? await Token.findOne({ where: { shareId: share.id, purpose: 'share-invite', usedAt: null }, order: [['expiresAt', 'DESC']] })
      : null;
  return {
    id: share.id,
    bowId: share.bowId,
    bowNickname: share.bow?.nickname ?? '',
    invitedEmail: share.invitedEmail,
    state: share.state,
    tech: share.tech ? { id: share.tech.id, name: share.tech.name, email: share.tech.email } : null,
    invitedAt: share.createdAt.toISOString(),
    acceptedAt: share.acceptedAt ? share.acceptedAt.toISOString() : null,
    revokedAt: share.revokedAt ? share.revokedAt.toISOString() : null,
    inviteExpiresAt: newest ? newest.expiresAt.toISOString() : null,
  };
}

async function reload(id: number): Promise<ShareJson> {
  const share = await Share.findByPk(id, { include: shareIncludes });
  // Gone already when its bow was deleted by another request in the meantime.
  if (!share) throw ApiError.notFound('That share');
  return shareJson(share);
}

/**
 * POST /api/bows/:bowId/shares: invite (or invite again, with a fresh link)
 * the technician at `email`. Refused when the bow is already shared with that address.
 */
export async function inviteTech(archer: User, bowId: number, email: string, now = new Date()): Promise<ShareJson> {
  const { bow } = await bowFor(archer, bowId, 'change');
  if (email === archer.email) {
    throw ApiError.badRequest('That is your own address. Enter the technician’s e-mail address.', {
      email: 'Enter the technician’s address, not your own',
    });
  }
  const { shareId, raw } = await sequelize.transaction(async (transaction) => {
    let share = await Share.findOne({
      where: { bowId, invitedEmail: email, state: { [Op.in]: ['invited', 'active'] } },
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (share?.state === 'active') {
      throw ApiError.conflict(`This bow is already shared with ${email}.`, { email: 'This bow is already shared with this address' });
    }
    if (share) {
      await retireTokens({ purpose: 'share-invite', shareId: share.id }, now, transaction);
    } else {
      share = await Share.create(
        { bowId, archerId: archer.id, techId: null, invitedEmail: email, acceptedAt: null, revokedAt: null },
        { transaction },
      );
    }
    const issued = await issueToken({ purpose: 'share-invite', shareId: share.id, validMs: inviteValidMs, now }, transaction);
    await recordAudit(
      {
        actorId: archer.id,
        action: 'invited',
        bowId,
        recordType: 'share',
        recordId: share.id,
        summary: `Invited ${email} to see and add to this bow`,
      },
      transaction,
    );
    return { shareId: share.id, raw: issued.raw };
  });
  try {
    await sendMail({
      to: email,
      ...inviteMessage({
        archerName: archer.name,
        bowNickname: bow.nickname,
        link: inviteLink(raw),
        expiresAt: new Date(now.getTime() + inviteValidMs),
      }),
    });
  } catch (err) {
    console.error(`Invitation e-mail to ${email} could not be sent: ${err instanceof Error ? err.message : err}`);
    throw new ApiError(502, 'mail_failed', 'The invitation is saved, but the e-mail could not be sent. Try “Send again” in a few minutes.');
  }
  return reload(shareId);
}

/** GET /api/bows/:bowId/shares: every share of the bow (newest first), for its archer. */
export async function listBowShares(archer: User, bowId: number): Promise<ShareJson[]> {
  await bowFor(archer, bowId, 'change');
  const shares = await Share.findAll({ where: { bowId }, include: shareIncludes, order: [['id', 'DESC']] });
  return Promise.all(shares.map(shareJson));
}

/** GET /api/shares: the shares of all the archer's bows that are not revoked. */
export async function listMyShares(archer: User): Promise<ShareJson[]> {
  const shares = await Share.findAll({
    where: { archerId: archer.id, state: { [Op.in]: ['invited', 'active'] } },
    include: shareIncludes,
    order: [['id', 'DESC']],
  });
  return Promise.all(shares.map(shareJson));
}

/** POST /api/shares/:id/revoke: ends the share at once (an open invitation link then reads as withdrawn). */
export async function revokeShare(archer: User, shareId: number, now = new Date()): Promise<ShareJson> {
  await sequelize.transaction(async (transaction) => {
    const share = await Share.findOne({
      where: { id: shareId, archerId: archer.id },
      include: shareIncludes,
      transaction,
      lock: transaction.LOCK.UPDATE,
    });
    if (!share) throw ApiError.notFound('That share');
    if (share.state === 'revoked') return;
    share.state = 'revoked';
    share.revokedAt = now;
    // Its invitation link, if still open, now finds a withdrawn share (see invitedShare).
    await share.save({ transaction });
    const who = share.tech ? `${share.tech.name} <${share.tech.email}>` : share.invitedEmail;
    await recordAudit(
      {
        actorId: archer.id,
        action: 'revoked',
        bowId: share.bowId,
        recordType: 'share',
        recordId: share.id,
        summary: `Ended the share with ${who}`,
      },
      transaction,
    );
  });
  return reload(shareId);
}

/** The share an invitation token opens, or the error the link's holder should see. */
async function invitedShare(raw: string, now: Date) {
  const { token, problem } = await checkToken('share-invite', raw, now);
  if (problem || !token?.shareId) throw tokenError(problem ?? 'unknown', linkWords);
  const share = await Share.findByPk(token.shareId, {
    include: [
      { model: Bow, as: 'bow', attributes: ['id', 'nickname'] },
      { model: User, as: 'archer', attributes: ['id', 'name'] },
    ],
  });
  if (!share || share.state !== 'invited') {
    throw new ApiError(410, 'link_withdrawn', 'The archer has withdrawn this invitation.');
  }
  return { token, share };
}

/** GET /api/invites/:token: what the accept page shows (no sign-in needed). */
export async function previewInvite(raw: string, now = new Date()): Promise<InvitePreview> {
  const { token, share } = await invitedShare(raw, now);
  return {
    archerName: share.archer!.name,
    bowNickname: share.bow!.nickname,
    invitedEmail: share.invitedEmail,
    expiresAt: token.expiresAt.toISOString(),
  };
}

/** POST /api/invites/accept: the signed-in technician accepts; the share becomes active. */
export async function acceptInvite(user: User, raw: string, now = new Date()): Promise<ShareJson> {
  if (user.role !== 'tech') {
    throw ApiError.forbidden(
      'Invitations are accepted with a technician account. Sign out, then sign in with your technician account or create one from the invitation link.',
    );
  }
  const shareId = await sequelize.transaction(async (transaction) => {
    const { token, problem } = await checkToken('share-invite', raw, now, transaction);
    if (problem || !token?.shareId) throw tokenError(problem ?? 'unknown', linkWords);
    const share = await Share.findByPk(token.shareId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!share || share.state !== 'invited') throw new ApiError(410, 'link_withdrawn', 'The archer has withdrawn this invitation.');
    if (share.invitedEmail !== user.email) {
      throw ApiError.forbidden(
        `This invitation was sent to ${share.invitedEmail}. Sign in with the account for that address to accept it.`,
      );
    }
    if (!(await consumeToken(token, now, transaction))) throw tokenError('used', linkWords);
    share.state = 'active';
    share.techId = user.id;
    share.acceptedAt = now;
    await share.save({ transaction });
    await recordAudit(
      {
        actorId: user.id,
        action: 'accepted',
        bowId: share.bowId,
        recordType: 'share',
        recordId: share.id,
        summary: `${user.name} accepted the invitation`,
      },
      transaction,
    );
    return share.id;
  });
  return reload(shareId);
}

/**
 * POST /api/invites/accept-new: creates a technician account for the invited
 * address and accepts the invitation with it. The address must be the one invited.
 */
export async function acceptWithNewAccount(input: InviteSignUp, now = new Date()): Promise<{ user: User; share: ShareJson }> {
  const { share } = await invitedShare(input.token, now);
  if (input.email !== share.invitedEmail) {
    throw ApiError.badRequest(`This invitation was sent to ${share.invitedEmail}; create the account with that address.`, {
      email: `Use the invited address, ${share.invitedEmail}`,
    });
  }
  const user = await signUp({ name: input.name, email: input.email, password: input.password }, 'tech');
  return { user, share: await acceptInvite(user, input.token, now) };
}

/** GET /api/clients: for a technician, each archer with the bows they actively share with them. */
export async function listClients(tech: User): Promise<Client[]> {
  const shares = await Share.findAll({
    where: { techId: tech.id, state: 'active' },
    include: [
      { model: Bow, as: 'bow', attributes: ['id', 'nickname', 'sightKind'] },
      { model: User, as: 'archer', attributes: ['id', 'name', 'email'] },
    ],
    order: [
      ['archerId', 'ASC'],
      ['bowId', 'ASC'],
    ],
  });
  const clients = new Map<number, Client>();
  for (const share of shares) {
    const archer = share.archer!;
    const client = clients.get(archer.id) ?? { archer: { id: archer.id, name: archer.name, email: archer.email }, bows: [] };
    client.bows.push({
      id: share.bow!.id,
      nickname: share.bow!.nickname,
      sightKind: share.bow!.sightKind,
      shareId: share.id,
      sharedSince: (share.acceptedAt ?? share.createdAt).toISOString(),
    });
    clients.set(archer.id, client);
  }
  return [...clients.values()].sort((a, b) => a.archer.name.localeCompare(b.archer.name));
}
