// Bird-number updates: appended to the flock's history, never edited; the history may never count fewer than zero birds.
import { BirdCount, Flock, House, Site } from '../../database/models/index.js';
import type { BirdCountInput } from '../../shared/flocks/bird-count-schemas.js';
import { firstNegativeEntry } from '../../shared/flocks/current-birds.js';
import type { FlockView } from '../../shared/flocks/flock-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { loadFlockView } from './flock-view.js';
import { siteToday } from './site-today.js';

export async function addBirdCount(context: AppContext, actorId: number, flockId: number, input: BirdCountInput): Promise<FlockView> {
  return context.sequelize.transaction(async (transaction) => {
    // The flock row lock puts concurrent updates in a queue, so each sees the history the one before it left.
    const flock = await Flock.findByPk(flockId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!flock) throw AppError.notFound('No such flock.');
    const house = await House.findByPk(flock.houseId, { include: [{ model: Site, as: 'site' }], transaction });
    const field = (message: string) => [{ field: 'countedOn', message }];
    const today = siteToday(house!.site!);
    // Before placement there are no birds on the farm to count or lose.
    if (flock.placementDate > today) throw AppError.conflict(`This flock is not placed yet: it is placed on ${flock.placementDate}.`, field(`Not placed until ${flock.placementDate}.`));
    if (input.countedOn < flock.placementDate) throw AppError.badRequest('The flock was not placed yet on that day.', field(`Placed on ${flock.placementDate}.`));
    if (input.countedOn > today) throw AppError.badRequest('Bird numbers are recorded on or after the day.', field('Not in the future.'));
    if (flock.depletedOn && input.countedOn > flock.depletedOn) throw AppError.badRequest('The flock was depleted by then.', field(`Depleted on ${flock.depletedOn}.`));
    const counts = (await BirdCount.findAll({ where: { flockId }, transaction })).map((count) => count.get({ plain: true }));
    const candidate = { id: Number.MAX_SAFE_INTEGER, countedOn: input.countedOn, kind: input.kind, birds: input.birds };
    const negative = firstNegativeEntry(flock.birdsPlaced, [...counts, candidate]);
    if (negative) {
      throw AppError.conflict('That would leave fewer than zero birds in the flock.', [{ field: 'birds', message: `More than the birds counted on ${negative.countedOn}.` }]);
    }
    const count = await BirdCount.create({ ...input, flockId, recordedBy: actorId }, { transaction });
    await recordAudit({ actorId, action: 'flock.bird_count', entity: 'flock', entityId: flockId, after: count.get({ plain: true }) }, transaction);
    return loadFlockView(flockId, transaction);
  });
}
