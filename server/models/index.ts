/**
 * Every model, registered in one place, and every association declared here.
 * Import models from this file, not from their own files.
 */
import { User } from './user';
import { WebSession } from './web-session';
import { Bow } from './bow';
import { ArrowBuild } from './arrow-build';
import { SightIn } from './sight-in';
import { SightInMark } from './sight-in-mark';
import { Tape } from './tape';
import { Photo } from './photo';
import { LevelCheck } from './level-check';
import { LevelStep } from './level-step';
import { BowChange } from './bow-change';
import { Share } from './share';
import { Token } from './token';
import { AuditEntry } from './audit-entry';
import { IdempotencyKey } from './idempotency-key';
import { installAddedByHooks } from './added-by';
import { SetupEntry } from './setup-entry';
import { PaperTuneRun } from './paper-tune-run';
import { PaperTuneShot } from './paper-tune-shot';
import { ArrowSet } from './arrow-set';
import { Arrow } from './arrow';
import { ArrowFlier } from './arrow-flier';
import { RangeConfirmation } from './range-confirmation';

WebSession.belongsTo(User, { foreignKey: 'userId', as: 'user' });

// Bows and what hangs off them. The database's foreign keys do the cascading
// (see migrations 0010–0014); these declarations are for queries.
User.hasMany(Bow, { foreignKey: 'userId', as: 'bows' });
Bow.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Bow.hasMany(ArrowBuild, { foreignKey: 'bowId', as: 'builds' });
ArrowBuild.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
Bow.hasMany(SightIn, { foreignKey: 'bowId', as: 'sightIns' });
SightIn.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
ArrowBuild.hasMany(SightIn, { foreignKey: 'buildId', as: 'sightIns' });
SightIn.belongsTo(ArrowBuild, { foreignKey: 'buildId', as: 'build' });
SightIn.hasMany(SightInMark, { foreignKey: 'sightInId', as: 'marks' });
SightInMark.belongsTo(SightIn, { foreignKey: 'sightInId', as: 'sightIn' });
SightIn.hasMany(Tape, { foreignKey: 'sightInId', as: 'tapes' });
Tape.belongsTo(SightIn, { foreignKey: 'sightInId', as: 'sightIn' });

// Level checks, their steps and photos, and the change log (migrations 0020–0023).
Bow.hasMany(LevelCheck, { foreignKey: 'bowId', as: 'levelChecks' });
LevelCheck.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
LevelCheck.belongsTo(User, { foreignKey: 'userId', as: 'performer' });
LevelCheck.hasMany(LevelStep, { foreignKey: 'checkId', as: 'steps' });
LevelStep.belongsTo(LevelCheck, { foreignKey: 'checkId', as: 'check' });
LevelStep.belongsTo(Photo, { foreignKey: 'photoId', as: 'photo' });
Bow.hasMany(Photo, { foreignKey: 'bowId', as: 'photos' });
Photo.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
Bow.hasMany(BowChange, { foreignKey: 'bowId', as: 'changes' });
BowChange.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
BowChange.belongsTo(User, { foreignKey: 'userId', as: 'loggedBy' });

// Sharing a bow with a technician, e-mailed tokens, the audit log (migrations 0030–0032).
Bow.hasMany(Share, { foreignKey: 'bowId', as: 'shares' });
Share.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
Share.belongsTo(User, { foreignKey: 'archerId', as: 'archer' });
Share.belongsTo(User, { foreignKey: 'techId', as: 'tech' });
Share.hasMany(Token, { foreignKey: 'shareId', as: 'tokens' });
Token.belongsTo(Share, { foreignKey: 'shareId', as: 'share' });
Token.belongsTo(User, { foreignKey: 'userId', as: 'user' });
AuditEntry.belongsTo(User, { foreignKey: 'actorId', as: 'actor' });
AuditEntry.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });

// Who added a build, a sight-in or a mark (migrations 0060–0062; hooks in added-by.ts).
ArrowBuild.belongsTo(User, { foreignKey: 'addedById', as: 'addedBy' });
SightIn.belongsTo(User, { foreignKey: 'addedById', as: 'addedBy' });
SightInMark.belongsTo(User, { foreignKey: 'addedById', as: 'addedBy' });
installAddedByHooks(
  ArrowBuild,
  async (build, transaction) =>
    (await Bow.findByPk(build.bowId, { attributes: ['id', 'userId'], transaction: transaction ?? undefined }))?.userId ?? null,
);
installAddedByHooks(
  SightIn,
  async (sightIn, transaction) =>
    (await Bow.findByPk(sightIn.bowId, { attributes: ['id', 'userId'], transaction: transaction ?? undefined }))?.userId ?? null,
);
installAddedByHooks(SightInMark, async (mark, transaction) => {
  const sightIn = await SightIn.findByPk(mark.sightInId, { attributes: ['id', 'bowId'], transaction: transaction ?? undefined });
  if (!sightIn) return null;
  return (await Bow.findByPk(sightIn.bowId, { attributes: ['id', 'userId'], transaction: transaction ?? undefined }))?.userId ?? null;
});

// Tuning: set-up entries, paper-tune runs and shots, arrow sets, arrows and fliers,
// range confirmations (migrations 0051–0057).
Bow.hasMany(SetupEntry, { foreignKey: 'bowId', as: 'setupEntries' });
SetupEntry.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
SetupEntry.belongsTo(User, { foreignKey: 'userId', as: 'addedBy' });
Bow.hasMany(PaperTuneRun, { foreignKey: 'bowId', as: 'paperTuneRuns' });
PaperTuneRun.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
PaperTuneRun.belongsTo(User, { foreignKey: 'userId', as: 'addedBy' });
PaperTuneRun.hasMany(PaperTuneShot, { foreignKey: 'runId', as: 'shots' });
PaperTuneShot.belongsTo(PaperTuneRun, { foreignKey: 'runId', as: 'run' });
PaperTuneShot.belongsTo(User, { foreignKey: 'userId', as: 'addedBy' });
ArrowBuild.hasMany(ArrowSet, { foreignKey: 'buildId', as: 'arrowSets' });
ArrowSet.belongsTo(ArrowBuild, { foreignKey: 'buildId', as: 'build' });
ArrowSet.belongsTo(User, { foreignKey: 'userId', as: 'addedBy' });
ArrowSet.hasMany(Arrow, { foreignKey: 'setId', as: 'arrows' });
Arrow.belongsTo(ArrowSet, { foreignKey: 'setId', as: 'set' });
Arrow.hasMany(ArrowFlier, { foreignKey: 'arrowId', as: 'fliers' });
ArrowFlier.belongsTo(Arrow, { foreignKey: 'arrowId', as: 'arrow' });
ArrowFlier.belongsTo(User, { foreignKey: 'userId', as: 'addedBy' });
SightIn.hasMany(RangeConfirmation, { foreignKey: 'sightInId', as: 'rangeConfirmations' });
RangeConfirmation.belongsTo(SightIn, { foreignKey: 'sightInId', as: 'sightIn' });
RangeConfirmation.belongsTo(User, { foreignKey: 'userId', as: 'confirmedBy' });

export {
  User,
  WebSession,
  Bow,
  ArrowBuild,
  SightIn,
  SightInMark,
  Tape,
  Photo,
  LevelCheck,
  LevelStep,
  BowChange,
  Share,
  Token,
  AuditEntry,
  IdempotencyKey,
};
export { SetupEntry, PaperTuneRun, PaperTuneShot, ArrowSet, Arrow, ArrowFlier, RangeConfirmation };
