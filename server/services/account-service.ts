/**
 * Accounts. Admin work: list with search, change role, disable/enable. The
 * signed-in account's own basics: change the password, delete the account.
 */
import bcrypt from 'bcryptjs';
import { Op, type Sequelize } from 'sequelize';
import { ApiError } from '@/server/errors';
import { AuditEntry, Bow, Photo, Share, User, WebSession } from '@/server/models';
import { formerAccountName, type AccountDelete, type PasswordChange } from '@/shared/account';
import type { AccountSearch, AccountUpdate } from '@/shared/admin';
import { endAllSessions, hashPassword } from './auth-service';
import { recordAudit } from './audit-service';
import { removeStoredPhotos } from './photo-service';

const PAGE_SIZE = 50;

export async function listAccounts({ q, page, role }: AccountSearch) {
  const like = q ? `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : undefined;
  const where = {
    ...(like ? { [Op.or]: [{ name: { [Op.like]: like } }, { email: { [Op.like]: like } }] } : {}),
    ...(role ? { role } : {}),
  };
  const { rows, count } = await User.findAndCountAll({ where, order: [['id', 'ASC']], limit: PAGE_SIZE, offset: (page - 1) * PAGE_SIZE });
  return {
    accounts: rows.map((u) => ({ ...u.toPublic(), disabled: u.disabled, createdAt: u.createdAt })),
    total: count,
    page,
    pageSize: PAGE_SIZE,
  };
}

export async function updateAccount(actor: User, id: number, update: AccountUpdate) {
  const user = await User.findByPk(id);
  if (!user) throw ApiError.notFound('That account');
  if (user.id === actor.id && (update.disabled === true || (update.role && update.role !== 'admin'))) {
    throw ApiError.badRequest('You cannot disable your own account or remove your own admin role.');
  }
  const before = { role: user.role, disabled: user.disabled };
  if (update.role) user.role = update.role;
  if (update.disabled !== undefined) user.disabled = update.disabled;
  await user.save();
  if (update.disabled) await endAllSessions(user.id);
  const who = `${user.name} <${user.email}>`;
  if (user.role !== before.role) {
    await recordAudit({
      actorId: actor.id,
      action: 'role-changed',
      bowId: null,
      recordType: 'account',
      recordId: user.id,
      summary: `Changed the role of ${who} from ${before.role} to ${user.role}`,
    });
  }
  if (user.disabled !== before.disabled) {
    const action = user.disabled ? 'disabled' : 'enabled';
    await recordAudit({
      actorId: actor.id,
      action,
      bowId: null,
      recordType: 'account',
      recordId: user.id,
      summary: `${user.disabled ? 'Disabled' : 'Enabled'} the account of ${who}`,
    });
  }
  return { ...user.toPublic(), disabled: user.disabled };
}

// ---- The signed-in account's own basics: password, deletion ----

/** The account's password checked again (for a change or a deletion); a wrong one is a field error. */
async function checkOwnPassword(user: User, password: string, field: string): Promise<void> {
  const ok = await bcrypt.compare(password, user.passwordHash);
  if (!ok) throw new ApiError(400, 'wrong_password', 'That password is not right.', { [field]: 'That password is not right' });
}

/**
 * POST /api/me/password: a new password after the current one is typed
 * again; every other sign-in of the account ends, this one stays.
 * Example: await changePassword(marit, 'sid-of-this-browser', { currentPassword, newPassword }) → { endedSessions: 2 }
 */
export async function changePassword(user: User, keepSid: string, input: PasswordChange): Promise<{ endedSessions: number }> {
  await checkOwnPassword(user, input.currentPassword, 'currentPassword');
  user.passwordHash = await hashPassword(input.newPassword);
  await user.save();
  const endedSessions = await WebSession.destroy({ where: { userId: user.id, sid: { [Op.ne]: keepSid } } });
  return { endedSessions };
}

/**
 * POST /api/me/delete: the account and everything of it, after its password
 * is typed again. Its bows go with every record on them (builds, sight-ins,
 * marks, tapes, level checks, photos: the foreign-key cascades) and their
 * photo files; its shares end (both sides: cascade); its sign-ins, links and
 * keys go (cascade). What it added to others' bows stays, its author now null
 * (SET NULL) and shown as "a former account"; the audit log keeps those
 * entries with its name and e-mail taken out of their words, and drops the
 * entries about its own bows and about the account itself.
 * Example: await deleteOwnAccount(marit, { password }) → undefined; User.findByPk(marit.id) → null
 */
export async function deleteOwnAccount(user: User, input: AccountDelete): Promise<void> {
  await checkOwnPassword(user, input.password, 'password');
  const bowIds = (await Bow.findAll({ where: { userId: user.id }, attributes: ['id'] })).map((bow) => bow.id);
  const photoKeys = bowIds.length
    ? (await Photo.findAll({ where: { bowId: { [Op.in]: bowIds } }, attributes: ['storageKey'] })).map((photo) => photo.storageKey)
    : [];
  const sequelize = User.sequelize as Sequelize;
  await sequelize.transaction(async (transaction) => {
    if (bowIds.length) await AuditEntry.destroy({ where: { bowId: { [Op.in]: bowIds } }, transaction });
    await AuditEntry.destroy({ where: { recordType: 'account', recordId: user.id }, transaction });
    // Its name and e-mail out of the words of the entries that stay (shares it was part of, its work on others' bows).
    for (const words of [user.email, `${user.name} <${formerAccountName}>`, user.name].filter((text) => text.length >= 2)) {
      await AuditEntry.update(
        { summary: sequelize.fn('REPLACE', sequelize.col('summary'), words, formerAccountName) as unknown as string },
        { where: { summary: { [Op.like]: `%${words.replace(/[\\%_]/g, (c) => `\\${c}`)}%` } }, transaction },
      );
    }
    // Invites still open to its address end too (accepted shares go with the account: cascade).
    await Share.destroy({ where: { invitedEmail: user.email }, transaction });
    await Bow.destroy({ where: { userId: user.id }, transaction });
    await user.destroy({ transaction });
    await recordAudit(
      {
        actorId: null,
        action: 'account-deleted',
        bowId: null,
        recordType: 'account',
        recordId: null,
        summary: 'An account was deleted at its owner’s request, with its bows and records',
      },
      transaction,
    );
  });
  // The rows are gone; the files follow (a file left by a crash is unreachable: no row names it).
  await removeStoredPhotos(photoKeys);
}
