/**
 * Who added a build, sight-in or mark, as the API sends it: `{ id, name }`, or
 * null once that account has been deleted (the screens say "a former account").
 * One query for the names of a list of rows.
 *
 * Example: const names = await addedByNames(builds); buildOut(build, 0, names).addedBy → { id: 7, name: 'Desmond Tull' }
 */
import { Op, type Transaction } from 'sequelize';
import { User } from '@/server/models';
import type { AddedBy } from '@/shared/added-by';

/** The account names of the rows' `addedById`s, by id. */
export async function addedByNames(rows: { addedById?: number | null }[], transaction?: Transaction): Promise<Map<number, string>> {
  const ids = [...new Set(rows.map((row) => row.addedById).filter((id): id is number => typeof id === 'number'))];
  if (ids.length === 0) return new Map();
  const users = await User.findAll({ where: { id: { [Op.in]: ids } }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((user) => [user.id, user.name]));
}

/** `{ id, name }` of the row's adder, or null (a deleted account, or none recorded). */
export function addedByOf(row: { addedById?: number | null }, names: Map<number, string>): AddedBy {
  const id = row.addedById;
  if (typeof id !== 'number') return null;
  const name = names.get(id);
  return name === undefined ? null : { id, name };
}
