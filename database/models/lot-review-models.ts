// The models of the veterinarian's review (issue 5 grows here), initialised and associated in one place.
import type { Sequelize } from 'sequelize';
import { HoldDecision } from './hold-decision.js';
import { Hold } from './hold.js';
import { User } from './user.js';

export { HoldDecision };

export function initLotReviewModels(sequelize: Sequelize): void {
  HoldDecision.initModel(sequelize);
  HoldDecision.belongsTo(Hold, { as: 'hold', foreignKey: 'holdId' });
  Hold.hasMany(HoldDecision, { as: 'decisions', foreignKey: 'holdId' });
  HoldDecision.belongsTo(User, { as: 'signer', foreignKey: 'signedBy' });
}
