/**
 * Numbered arrow sets on an arrow build (shared/arrow-set.ts): add a set with
 * its arrows, change an arrow's status, note, spin check or weight, and
 * record that an arrow flew out of the group at a sight-in. Access through
 * bow-access.ts: the archer and a technician with an active share read and
 * add sets; an arrow is changed by the bow's archer or by whoever added its
 * set (a technician never changes the archer's records).
 *
 * Example: await createArrowSet(marit, 7, { name: 'Hunting six', toleranceGr: 2, arrows: [...] })
 */
import { UniqueConstraintError } from 'sequelize';
import { sequelize } from '@/server/db';
import { ApiError, validationError, found } from '@/server/errors';
import { Arrow, ArrowBuild, ArrowFlier, ArrowSet, SightIn, User } from '@/server/models';
import { arrowFor, buildFor } from '@/server/services/bow-access';
import { personJson } from '@/server/services/tuning-service';
import { arrowInputSchema, type ArrowSet as ArrowSetJson, type ArrowSetInput, type ArrowUpdate } from '@/shared/arrow-set';

const setIncludes = () => [
  { model: User, as: 'addedBy', attributes: ['id', 'name'] },
  {
    model: Arrow,
    as: 'arrows',
    include: [{ model: ArrowFlier, as: 'fliers', include: [{ model: User, as: 'addedBy', attributes: ['id', 'name'] }] }],
  },
];

function setJson(set: ArrowSet, build: ArrowBuild, ownerId: number): ArrowSetJson {
  return {
    id: set.id,
    buildId: set.buildId,
    bowId: build.bowId,
    name: set.name,
    toleranceGr: set.toleranceGr,
    addedBy: personJson(set.addedBy),
    byTechnician: set.userId !== ownerId,
    buildTotalGr: Number.isFinite(build.totalGr) ? build.totalGr : null,
    createdAt: set.createdAt.toISOString(),
    arrows: [...(set.arrows ?? [])]
      .sort((a, b) => a.number - b.number)
      .map((arrow) => ({
        id: arrow.id,
        number: arrow.number,
        weightGr: arrow.weightGr,
        spinKind: arrow.spinKind,
        runout: arrow.runout,
        note: arrow.note,
        status: arrow.status,
        fliers: (arrow.fliers ?? []).map((f) => ({ id: f.id, sightInId: f.sightInId, note: f.note, addedBy: personJson(f.addedBy) })),
      })),
  };
}

/** GET /api/builds/:id/arrow-sets: oldest first. */
export async function listArrowSets(user: User, buildId: number): Promise<ArrowSetJson[]> {
  const { build, bow } = await buildFor(user, buildId, 'read');
  const sets = await ArrowSet.findAll({ where: { buildId }, include: setIncludes(), order: [['id', 'ASC']] });
  return sets.map((set) => setJson(set, build, bow.userId));
}

/** POST /api/builds/:id/arrow-sets */
export async function createArrowSet(user: User, buildId: number, input: ArrowSetInput): Promise<ArrowSetJson> {
  const { build, bow } = await buildFor(user, buildId, 'add');
  const id = await sequelize.transaction(async (transaction) => {
    const set = await ArrowSet.create({ buildId, userId: user.id, name: input.name, toleranceGr: input.toleranceGr }, { transaction });
    await Arrow.bulkCreate(
      input.arrows.map((arrow) => ({
        ...arrow,
        runout: arrow.spinKind === 'thou' || arrow.spinKind === 'mm' ? arrow.runout : null,
        setId: set.id,
      })),
      { transaction },
    );
    return set.id;
  });
  return setJson(found(await ArrowSet.findByPk(id, { include: setIncludes() }), 'That arrow set'), build, bow.userId);
}

/** The arrow, its set and build, when the user may change it (the archer, or whoever added the set). */
async function changeableArrow(user: User, arrowId: number) {
  const { arrow, set, build, bow } = await arrowFor(user, arrowId, 'add');
  if (bow.userId !== user.id && set.userId !== user.id) {
    throw ApiError.forbidden('A technician can add records to a shared bow but cannot delete or change the archer’s records.');
  }
  return { arrow, set, build, bow };
}

/** PATCH /api/arrows/:id: status, note, spin check, weight. */
export async function updateArrow(user: User, arrowId: number, update: ArrowUpdate): Promise<ArrowSetJson> {
  const { arrow, set, build, bow } = await changeableArrow(user, arrowId);
  const merged = arrowInputSchema.safeParse({
    number: arrow.number,
    weightGr: arrow.weightGr,
    spinKind: arrow.spinKind,
    runout: arrow.runout,
    note: arrow.note,
    status: arrow.status,
    ...update,
  });
  if (!merged.success) throw validationError(merged.error);
  arrow.set({ ...merged.data, runout: merged.data.spinKind === 'thou' || merged.data.spinKind === 'mm' ? merged.data.runout : null });
  await arrow.save();
  return setJson(found(await ArrowSet.findByPk(set.id, { include: setIncludes() }), 'That arrow set'), build, bow.userId);
}

/** POST /api/arrows/:id/fliers: the arrow flew out of the group at that sight-in (of the same bow). */
export async function addFlier(user: User, arrowId: number, input: { sightInId: number; note: string }): Promise<ArrowSetJson> {
  const { arrow, set, build, bow } = await arrowFor(user, arrowId, 'add');
  const sightIn = await SightIn.findByPk(input.sightInId, { attributes: ['id', 'bowId'] });
  if (!sightIn || sightIn.bowId !== bow.id)
    throw ApiError.badRequest('That sight-in is not one of this bow’s.', { sightInId: 'Choose one of this bow’s sight-ins' });
  try {
    await ArrowFlier.create({ arrowId, sightInId: input.sightInId, userId: user.id, note: input.note });
  } catch (err) {
    if (err instanceof UniqueConstraintError)
      throw ApiError.conflict(`Arrow ${arrow.number} is already marked as flying out at that sight-in.`);
    throw err;
  }
  return setJson(found(await ArrowSet.findByPk(set.id, { include: setIncludes() }), 'That arrow set'), build, bow.userId);
}
