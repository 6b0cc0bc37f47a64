import type { Sequelize } from 'sequelize';
import { Session } from './session.js';
import { Studio } from './studio.js';
import { User } from './user.js';

export { Session, Studio, User };

/** Registers every model and its associations on one Sequelize instance. */
export function modelsInit(sequelize: Sequelize): void {
  Studio.initModel(sequelize);
  User.initModel(sequelize);
  Session.initModel(sequelize);

  Studio.hasMany(User, { foreignKey: 'studioId', as: 'members' });
  User.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
}
