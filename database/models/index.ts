// Initialises every model on a Sequelize instance and declares the associations in one place.
import { Sequelize } from 'sequelize';
import { AuditEntry } from './audit-entry.js';
import { Fridge } from './fridge.js';
import { House } from './house.js';
import { Site } from './site.js';
import { User } from './user.js';
import { UserSite } from './user-site.js';
import { initReceivingModels } from './receiving-models.js';
import { initFridgeLogModels } from './fridge-log-models.js';
import { initFlockModels } from './flock-models.js';
import { initLotReviewModels } from './lot-review-models.js';
import { initStockCountModels } from './stock-count-models.js';
import { initHoldEventModels } from './hold-event-models.js';

export { AuditEntry, Fridge, House, Site, User, UserSite };
export * from './receiving-models.js';
export * from './fridge-log-models.js';
export * from './flock-models.js';
export * from './lot-review-models.js';
export * from './stock-count-models.js';
export * from './hold-event-models.js';

export function initModels(sequelize: Sequelize): void {
  for (const model of [Site, User, UserSite, AuditEntry, House, Fridge]) model.initModel(sequelize);
  User.belongsToMany(Site, { through: UserSite, as: 'sites', foreignKey: 'userId', otherKey: 'siteId' });
  Site.belongsToMany(User, { through: UserSite, as: 'users', foreignKey: 'siteId', otherKey: 'userId' });
  House.belongsTo(Site, { as: 'site', foreignKey: 'siteId' });
  Fridge.belongsTo(Site, { as: 'site', foreignKey: 'siteId' });
  Site.hasMany(House, { as: 'houses', foreignKey: 'siteId' });
  Site.hasMany(Fridge, { as: 'fridges', foreignKey: 'siteId' });
  AuditEntry.belongsTo(User, { as: 'actor', foreignKey: 'actorId' });
  initReceivingModels(sequelize);
  initFridgeLogModels(sequelize);
  initFlockModels(sequelize);
  initLotReviewModels(sequelize);
  initStockCountModels(sequelize);
  initHoldEventModels(sequelize);
}

/** Opens the application's connection pool (as the application role) with every model ready. */
export function connectDatabase(url: string, options: { poolMax?: number } = {}): Sequelize {
  const sequelize = new Sequelize(url, {
    logging: false,
    pool: { max: options.poolMax ?? 10, acquire: 10_000 },
    dialectOptions: { application_name: 'vialyard' },
  });
  initModels(sequelize);
  return sequelize;
}
