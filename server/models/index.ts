// The model registry: every model is initialised here, then associations are wired once.
import { sequelize } from '../db';
import { Session } from './session';
import { User } from './user';

User.initModel(sequelize);
Session.initModel(sequelize);

export { sequelize, Session, User };
