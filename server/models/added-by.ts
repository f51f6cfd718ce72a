/**
 * Who added an arrow build, a sight-in or a mark (`addedById`, migrations
 * 0060–0062). Hooks fill it on create when the caller did not: the signed-in
 * user of the API request (server/services/audit-context.ts), or, outside a
 * request (seed, command line), the bow's owner. A caller that rewrites rows
 * (the sight-ins service replaces a sight-in's marks) passes the stored value on.
 *
 * Example: installAddedByHooks(ArrowBuild, async (build) => (await Bow.findByPk(build.bowId))?.userId ?? null)
 */
import type { Model, ModelStatic, Transaction } from 'sequelize';
import { currentActor } from '@/server/services/audit-context';

type Attributed = Model & { addedById?: number | null };

/** Adds the beforeCreate and beforeBulkCreate hooks to `model`; `ownerOf` finds the bow owner of a row. */
export function installAddedByHooks<M extends Attributed>(
  model: ModelStatic<M>,
  ownerOf: (row: M, transaction?: Transaction | null) => Promise<number | null>,
): void {
  const fill = async (row: M, transaction?: Transaction | null) => {
    if (row.addedById !== undefined && row.addedById !== null) return;
    row.addedById = currentActor()?.id ?? (await ownerOf(row, transaction));
  };
  model.addHook('beforeCreate', 'added-by', async (row: M, options: { transaction?: Transaction | null }) => {
    await fill(row, options.transaction);
  });
  model.addHook('beforeBulkCreate', 'added-by', async (rows: M[], options: { transaction?: Transaction | null; fields?: string[] }) => {
    for (const row of rows) await fill(row, options.transaction);
    // bulkCreate writes only the fields it was given unless told: make sure ours goes too.
    if (options.fields && !options.fields.includes('addedById')) options.fields.push('addedById');
  });
}
