/**
 * Every model, registered in one place, and every association declared here.
 * Import models from this file, not from their own files.
 */
import { User } from './user';
import { WebSession } from './web-session';

WebSession.belongsTo(User, { foreignKey: 'userId', as: 'user' });

export { User, WebSession };
