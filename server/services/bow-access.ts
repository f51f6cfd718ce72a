/**
 * Who may do what with a bow's records — the one access path every service
 * uses. Three capabilities:
 *   read   — see the bow and everything on it: its owner, or a technician
 *            with an active share of it;
 *   write  — add records to it (sight-ins, marks, level checks, changes,
 *            notes): the same people as read;
 *   add-build — add an arrow build (a new, attributed entry: the archer's
 *            builds are never changed): the same people as read;
 *   delete — delete or change the archer's records, edit the bow itself,
 *            share it: its owner only.
 * A share is checked on every request, so revoking it takes effect at once.
 * Someone who may not read a bow gets a 404 (never told apart from a missing
 * bow); a technician who may read it but asks to delete gets a 403.
 */
import { Bow, Share, type User } from '@/server/models';
import { ApiError } from '@/server/errors';

export type BowCapability = 'read' | 'write' | 'add-build' | 'delete';

/** How a user reaches a bow: as its owner, or through the active share `shareId`. */
export type BowAccess = { bow: Bow; owner: boolean; shareId: number | null };

/**
 * The user's access to the bow, or null when they have none (or there is no such bow).
 * Example: await bowAccess(desmond, 12) → { bow, owner: false, shareId: 3 } while Marit shares bow 12 with him
 */
export async function bowAccess(user: Pick<User, 'id'>, bowId: number): Promise<BowAccess | null> {
  const bow = await Bow.findByPk(bowId);
  if (!bow) return null;
  if (bow.userId === user.id) return { bow, owner: true, shareId: null };
  const share = await Share.findOne({ where: { bowId, techId: user.id, state: 'active' }, attributes: ['id'] });
  return share ? { bow, owner: false, shareId: share.id } : null;
}

/** True when the access grants the capability. */
export function allows(access: BowAccess | null, capability: BowCapability): boolean {
  if (!access) return false;
  return capability === 'delete' ? access.owner : true;
}

/**
 * True when `user` may use the capability on the bow.
 * Example: await canOnBow(desmond, 12, 'delete') → false (a technician never deletes an archer's records)
 */
export async function canOnBow(user: Pick<User, 'id'>, bowId: number, capability: BowCapability): Promise<boolean> {
  return allows(await bowAccess(user, bowId), capability);
}

/**
 * The bow and the access, when `user` may use the capability on it; else a
 * 404 (no read access; `what` names the record asked for, e.g. "That arrow
 * build") or a 403 (a technician asking to delete).
 * Example: const { bow } = await bowFor(req.user, 12, 'write')
 */
export async function bowFor(user: Pick<User, 'id'>, bowId: number, capability: BowCapability, what = 'That bow'): Promise<BowAccess> {
  const access = await bowAccess(user, bowId);
  if (!access) throw ApiError.notFound(what);
  if (!allows(access, capability)) {
    throw ApiError.forbidden('A technician can add records to a shared bow but cannot delete or change the archer’s records.');
  }
  return access;
}

/** True when `user` may add records to the bow (owner or active share). */
export async function canWriteBow(user: Pick<User, 'id'>, bowId: number): Promise<boolean> {
  return canOnBow(user, bowId, 'write');
}

/** True when `user` may delete the bow's records or change the bow (owner only). */
export async function canDeleteOnBow(user: Pick<User, 'id'>, bowId: number): Promise<boolean> {
  return canOnBow(user, bowId, 'delete');
}

/** The bow, when `user` may add records to it; else 404. */
export async function writableBow(user: Pick<User, 'id'>, bowId: number): Promise<Bow> {
  return (await bowFor(user, bowId, 'write')).bow;
}

/** The bow, when `user` owns it; 404 when they cannot read it, 403 for a technician it is shared with. */
export async function ownedBow(user: Pick<User, 'id'>, bowId: number): Promise<Bow> {
  return (await bowFor(user, bowId, 'delete')).bow;
}

/**
 * True when `user` may read the bow's records.
 * Example: await canReadBow(marit, 12) → true for Marit's own bow 12, false for anyone else's (or a missing bow)
 */
export async function canReadBow(user: Pick<User, 'id'>, bowId: number): Promise<boolean> {
  return canOnBow(user, bowId, 'read');
}

/**
 * The bow, when `user` may read it; otherwise a 404 (another account's bow is
 * never told apart from a missing one).
 * Example: const bow = await readableBow(req.user, 12)
 */
export async function readableBow(user: Pick<User, 'id'>, bowId: number): Promise<Bow> {
  return (await bowFor(user, bowId, 'read')).bow;
}
