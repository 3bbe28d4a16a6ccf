// Houses of a site: listed with the flock in each today, added and changed by those who keep flocks.
import { Op, type Transaction } from 'sequelize';
import { Flock, House, Site } from '../../database/models/index.js';
import type { HouseInput, HouseView } from '../../shared/flocks/house-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { withConstraintConflicts } from '../flocks/constraint-conflict.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';

export async function siteOfHouse(id: number): Promise<number | null> {
  return (await House.findByPk(id, { attributes: ['siteId'] }))?.siteId ?? null;
}

/** The flock placed in each house and not yet depleted today. */
async function currentFlocks(houses: House[], today: string, transaction?: Transaction): Promise<Map<number, Flock>> {
  if (!houses.length) return new Map();
  const flocks = await Flock.findAll({
    where: {
      houseId: houses.map((house) => house.id),
      placementDate: { [Op.lte]: today },
      [Op.or]: [{ depletedOn: null }, { depletedOn: { [Op.gt]: today } }],
    },
    order: [['placementDate', 'ASC']],
    transaction,
  });
  return new Map(flocks.map((flock) => [flock.houseId, flock]));
}

function toHouseView(house: House, flock: Flock | undefined): HouseView {
  return {
    id: house.id,
    siteId: house.siteId,
    name: house.name,
    housing: house.housing,
    capacity: house.capacity ?? null,
    active: house.active,
    currentFlock: flock ? { id: flock.id, name: flock.name } : null,
  };
}

export async function listHouses(siteId: number): Promise<HouseView[]> {
  const site = await Site.findByPk(siteId);
  if (!site) throw AppError.notFound('No such site.');
  const houses = await House.findAll({ where: { siteId }, order: [['name', 'ASC'], ['id', 'ASC']] });
  const flocks = await currentFlocks(houses, siteToday(site));
  return houses.map((house) => toHouseView(house, flocks.get(house.id)));
}

async function loadHouseView(id: number, transaction: Transaction): Promise<HouseView> {
  const house = await House.findByPk(id, { include: [{ model: Site, as: 'site' }], transaction });
  if (!house) throw AppError.notFound('No such house.');
  const flocks = await currentFlocks([house], siteToday(house.site!), transaction);
  return toHouseView(house, flocks.get(house.id));
}

async function assertNameFree(siteId: number, name: string, exceptId: number | null, transaction: Transaction): Promise<void> {
  const clash = await House.findOne({ where: { siteId, name: { [Op.iLike]: name } }, transaction });
  if (clash && clash.id !== exceptId) throw AppError.conflict('Another house on this site has this name.', [{ field: 'name', message: 'Already in use on this site.' }]);
}

const nameConflict = { houses_site_id_name_key: { field: 'name', message: 'Another house on this site has this name.' } };

export async function createHouse(context: AppContext, actorId: number, siteId: number, input: HouseInput): Promise<HouseView> {
  return context.sequelize.transaction(async (transaction) => {
    if (!(await Site.findByPk(siteId, { transaction }))) throw AppError.notFound('No such site.');
    await assertNameFree(siteId, input.name, null, transaction);
    const house = await withConstraintConflicts(() => House.create({ ...input, siteId }, { transaction }), nameConflict);
    const view = await loadHouseView(house.id, transaction);
    await recordAudit({ actorId, action: 'house.create', entity: 'house', entityId: house.id, after: view }, transaction);
    return view;
  });
}

export async function updateHouse(context: AppContext, actorId: number, id: number, input: HouseInput): Promise<HouseView> {
  return context.sequelize.transaction(async (transaction) => {
    const house = await House.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!house) throw AppError.notFound('No such house.');
    await assertNameFree(house.siteId, input.name, id, transaction);
    const before = await loadHouseView(id, transaction);
    if (!input.active && before.currentFlock) {
      throw AppError.conflict('A house with a flock in it stays in use.', [{ field: 'active', message: `Flock ${before.currentFlock.name} is in this house.` }]);
    }
    await withConstraintConflicts(() => house.update(input, { transaction }), nameConflict);
    const after = await loadHouseView(id, transaction);
    await recordAudit({ actorId, action: 'house.update', entity: 'house', entityId: id, before, after }, transaction);
    return after;
  });
}
