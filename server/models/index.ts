/**
 * Every model, registered in one place, and every association declared here.
 * Import models from this file, not from their own files.
 */
import { User } from './user';
import { WebSession } from './web-session';
import { Bow } from './bow';
import { ArrowBuild } from './arrow-build';
import { SightSession } from './sight-session';
import { SessionMark } from './session-mark';
import { Tape } from './tape';

WebSession.belongsTo(User, { foreignKey: 'userId', as: 'user' });

// Bows and what hangs off them. The database's foreign keys do the cascading
// (see migrations 0010–0014); these declarations are for queries.
User.hasMany(Bow, { foreignKey: 'userId', as: 'bows' });
Bow.belongsTo(User, { foreignKey: 'userId', as: 'user' });
Bow.hasMany(ArrowBuild, { foreignKey: 'bowId', as: 'builds' });
ArrowBuild.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
Bow.hasMany(SightSession, { foreignKey: 'bowId', as: 'sessions' });
SightSession.belongsTo(Bow, { foreignKey: 'bowId', as: 'bow' });
ArrowBuild.hasMany(SightSession, { foreignKey: 'buildId', as: 'sessions' });
SightSession.belongsTo(ArrowBuild, { foreignKey: 'buildId', as: 'build' });
SightSession.hasMany(SessionMark, { foreignKey: 'sessionId', as: 'marks' });
SessionMark.belongsTo(SightSession, { foreignKey: 'sessionId', as: 'session' });
SightSession.hasMany(Tape, { foreignKey: 'sessionId', as: 'tapes' });
Tape.belongsTo(SightSession, { foreignKey: 'sessionId', as: 'session' });

export { User, WebSession, Bow, ArrowBuild, SightSession, SessionMark, Tape };
