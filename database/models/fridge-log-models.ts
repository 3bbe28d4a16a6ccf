// The fridge-log feature's models (loggers, certificates, imports, checks, excursions) and their associations.
import type { Sequelize } from 'sequelize';
import { DailyCheck } from './daily-check.js';
import { Excursion } from './excursion.js';
import { Fridge } from './fridge.js';
import { LogImport } from './log-import.js';
import { Logger } from './logger.js';
import { LoggerCertificate } from './logger-certificate.js';
import { User } from './user.js';

export { DailyCheck, Excursion, LogImport, Logger, LoggerCertificate };

/** Call after the foundation's models are initialised (it associates with Fridge and User). */
export function initFridgeLogModels(sequelize: Sequelize): void {
  for (const model of [Logger, LoggerCertificate, LogImport, DailyCheck, Excursion]) model.initModel(sequelize);
  Fridge.hasMany(Logger, { as: 'loggers', foreignKey: 'fridgeId' });
  Logger.belongsTo(Fridge, { as: 'fridge', foreignKey: 'fridgeId' });
  Logger.hasMany(LoggerCertificate, { as: 'certificates', foreignKey: 'loggerId' });
  LogImport.belongsTo(Logger, { as: 'logger', foreignKey: 'loggerId' });
  LogImport.belongsTo(User, { as: 'importer', foreignKey: 'importedBy' });
  DailyCheck.belongsTo(User, { as: 'recorder', foreignKey: 'recordedBy' });
  Excursion.belongsTo(Fridge, { as: 'fridge', foreignKey: 'fridgeId' });
}
