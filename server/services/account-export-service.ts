/**
 * Everything of an account in one JSON document (GET /api/me/export.json):
 * the account and its unit choices, then every bow it owns as that bow's own
 * export (export-service's exportBowJson: bow, builds, sight-ins with marks and
 * whatever else a bow's export carries), plus each bow's tape layouts, level
 * checks with their steps, logged changes and the list of its photos (the
 * photos themselves are downloaded one by one).
 *
 * Example: JSON.parse((await exportAccountJson(marit)).body).bows.length → 2
 */
import { Op } from 'sequelize';
import { Bow, BowChange, LevelCheck, LevelStep, Photo, Tape, type User } from '@/server/models';
import { exportBowJson, slug, type ExportFile } from '@/server/services/export-service';

/** A row as stored, without the keys that only tie it to rows shown around it. */
const plainRow = (row: { get: (options: { plain: true }) => object }, drop: readonly string[] = []) =>
  Object.fromEntries(Object.entries(row.get({ plain: true })).filter(([key]) => !drop.includes(key)));

/** GET /api/me/export.json */
export async function exportAccountJson(user: User, now = new Date()): Promise<ExportFile> {
  const owned = await Bow.findAll({ where: { userId: user.id }, attributes: ['id'], order: [['id', 'ASC']] });
  const bows = [];
  for (const { id } of owned) {
    const {
      format: _format,
      version: _version,
      exportedAt: _at,
      note: _note,
      ...records
    } = JSON.parse(String((await exportBowJson(user, id, now)).body));
    const sightInIds = (records.sightIns as { id: number }[]).map((sightIn) => sightIn.id);
    const [tapes, checks, changes, photos] = await Promise.all([
      sightInIds.length ? Tape.findAll({ where: { sightInId: { [Op.in]: sightInIds } }, order: [['id', 'ASC']] }) : Promise.resolve([]),
      LevelCheck.findAll({ where: { bowId: id }, include: [{ model: LevelStep, as: 'steps' }], order: [['id', 'ASC']] }),
      BowChange.findAll({ where: { bowId: id }, order: [['id', 'ASC']] }),
      Photo.findAll({ where: { bowId: id }, order: [['id', 'ASC']] }),
    ]);
    bows.push({
      ...records,
      tapes: tapes.map((tape) => plainRow(tape)),
      levelChecks: checks.map((check) => plainRow(check, ['bowId'])),
      changes: changes.map((change) => plainRow(change, ['bowId'])),
      photos: photos.map((photo) => ({ ...plainRow(photo, ['bowId', 'storageKey']), url: `/api/photos/${photo.id}` })),
    });
  }
  const document = {
    format: 'pinwright-account-export',
    version: 1,
    exportedAt: now.toISOString(),
    note: 'Lengths in millimetres, masses in grains, speeds in feet per second, altitude in metres, temperature in °C; distances in the unit given with each mark. Each bow has the fields of a bow’s own export (pinwright-bow-export), plus its tapes, level checks, changes and photos.',
    account: user.toPublic(),
    bows,
  };
  return {
    body: `${JSON.stringify(document, null, 2)}\n`,
    contentType: 'application/json; charset=utf-8',
    fileName: `pinwright-${slug(user.name, 'account')}-everything.json`,
  };
}
