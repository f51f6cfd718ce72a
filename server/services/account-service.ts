/** Admin work on accounts: list with search, change role, disable/enable. */
import { Op } from 'sequelize';
import { ApiError } from '@/server/errors';
import { User } from '@/server/models';
import type { AccountSearch, AccountUpdate } from '@/shared/admin';
import { endAllSessions } from './auth-service';
import { recordAudit } from './audit-service';

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
    await recordAudit({ actorId: actor.id, action: 'role-changed', bowId: null, recordType: 'account', recordId: user.id, summary: `Changed the role of ${who} from ${before.role} to ${user.role}` });
  }
  if (user.disabled !== before.disabled) {
    const action = user.disabled ? 'disabled' : 'enabled';
    await recordAudit({ actorId: actor.id, action, bowId: null, recordType: 'account', recordId: user.id, summary: `${user.disabled ? 'Disabled' : 'Enabled'} the account of ${who}` });
  }
  return { ...user.toPublic(), disabled: user.disabled };
}
