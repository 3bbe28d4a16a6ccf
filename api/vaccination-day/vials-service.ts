// Vials out and back: issue by scanning each lot (held, expired or wrong-product lots refused), return unopened vials with their time out.
import { Op, type Transaction } from 'sequelize';
import { Fridge, Lot, Presentation, StockBalance, Vaccination } from '../../database/models/index.js';
import { BarcodeError } from '../../shared/barcode/barcode-error.js';
import { parseBarcode } from '../../shared/barcode/parse-barcode.js';
import type { IssueInput, ReturnInput } from '../../shared/vaccination-day/day-schemas.js';
import type { RunView } from '../../shared/vaccination-day/day-views.js';
import { checkReturn } from '../../shared/vaccination-day/vial-returns.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { siteToday } from '../flocks/site-today.js';
import { AppError } from '../http/app-error.js';
import { openHold, undecidedHoldsByLot } from '../lots/holds.js';
import { postMovement } from '../lots/stock-ledger.js';
import { loadLotsOut, loadProgress } from './run-state.js';
import { loadRunView } from './run-view.js';
import { loadFacts } from './vaccination-facts.js';

/** The vaccination, read-locked: issues and returns run side by side, the signing of the record waits for them. */
async function lockForVials(vaccinationId: number, transaction: Transaction): Promise<Vaccination> {
  const vaccination = await Vaccination.findByPk(vaccinationId, { transaction, lock: transaction.LOCK.SHARE });
  if (!vaccination) throw AppError.notFound('No such vaccination.');
  if (vaccination.status !== 'confirmed') throw AppError.conflict(`This vaccination is ${vaccination.status}; vials no longer move for it.`);
  return vaccination;
}

async function findScannedLot(input: IssueInput, productId: number, transaction: Transaction): Promise<Lot> {
  const field = input.barcode ? 'barcode' : 'lotNumber';
  let gtin: string | null = null;
  let lotNumber = input.lotNumber ?? null;
  if (input.barcode) {
    try {
      const parsed = parseBarcode(input.barcode);
      gtin = parsed.gtin;
      lotNumber = parsed.lot;
    } catch (error) {
      if (error instanceof BarcodeError) throw AppError.unprocessable(`The barcode could not be read: ${error.message}.`, [{ field, message: error.message }]);
      throw error;
    }
    if (!lotNumber) throw AppError.unprocessable('The barcode carries no lot number: type the lot number.', [{ field, message: 'No lot (10) in the barcode.' }]);
  }
  const presentationWhere = gtin ? { [Op.or]: [{ packGtin: gtin }, { vialGtin: gtin }] } : {};
  const candidates = await Lot.findAll({
    where: { lotNumber: { [Op.iLike]: lotNumber!.replace(/[\\%_]/g, '\\$&') } },
    include: [{ model: Presentation, as: 'presentation', where: presentationWhere }],
    transaction,
  });
  if (!candidates.length) throw AppError.unprocessable(`No lot ${lotNumber}${gtin ? ` with GTIN ${gtin}` : ''} is known.`, [{ field, message: 'Unknown lot.' }]);
  const right = candidates.filter((lot) => lot.presentation!.productId === productId);
  if (!right.length) throw AppError.unprocessable(`Lot ${lotNumber} is another product, not the one this vaccination uses.`, [{ field, message: 'Wrong product.' }]);
  if (right.length > 1) throw AppError.unprocessable(`Several packs carry lot ${lotNumber}: scan the barcode instead.`, [{ field, message: 'Scan to tell them apart.' }]);
  return right[0]!;
}

export async function issueVials(context: AppContext, actorId: number, vaccinationId: number, input: IssueInput): Promise<RunView> {
  await context.sequelize.transaction(async (transaction) => {
    await lockForVials(vaccinationId, transaction);
    const facts = await loadFacts(vaccinationId, transaction);
    if (!(await loadProgress(context, vaccinationId, transaction)).startedAt) throw AppError.conflict('Start the vaccination (checks done) before taking vials out.');
    const lot = await findScannedLot(input, facts.product.id, transaction);
    const field = input.barcode ? 'barcode' : 'lotNumber';
    const holds = (await undecidedHoldsByLot([lot.id], transaction)).get(lot.id) ?? [];
    if (holds.length) throw AppError.conflict(`Lot ${lot.lotNumber} is on hold (${holds.map((h) => h.cause).join(', ')}): do not use it; ask the veterinarian.`, [{ field, message: 'On hold.' }]);
    const today = siteToday(facts.site);
    if (lot.expiry < today) throw AppError.conflict(`Lot ${lot.lotNumber} expired on ${lot.expiry}.`, [{ field, message: 'Expired.' }]);
    const fridges = await Fridge.findAll({ where: { siteId: facts.site.id }, attributes: ['id'], transaction });
    const balances = await StockBalance.findAll({ where: { lotId: lot.id, fridgeId: fridges.map((f) => f.id), vials: { [Op.gt]: 0 } }, transaction });
    let fridgeId = input.fridgeId;
    if (fridgeId === undefined) {
      if (!balances.length) throw AppError.conflict(`No vials of lot ${lot.lotNumber} are left in this site's fridges.`, [{ field: 'vials', message: 'None left.' }]);
      if (balances.length > 1) throw AppError.unprocessable('The lot is in several fridges: choose one.', [{ field: 'fridgeId', message: 'Choose the fridge.' }]);
      fridgeId = balances[0]!.fridgeId;
    } else if (!fridges.some((f) => f.id === fridgeId)) {
      throw AppError.unprocessable('That fridge is not on this site.', [{ field: 'fridgeId', message: 'Not on this site.' }]);
    }
    const now = new Date();
    const movement = await postMovement(
      { lotId: lot.id, kind: 'issue', vials: input.vials, fromFridgeId: fridgeId, leftAt: now, at: now, sourceKind: 'vaccination', sourceId: vaccinationId, reason: 'vaccination day', recordedBy: actorId },
      transaction,
    );
    await recordAudit({ actorId, action: 'vaccination.issue', entity: 'vaccination', entityId: vaccinationId, after: { movementId: movement.id, lotId: lot.id, fridgeId, vials: input.vials } }, transaction);
  });
  return loadRunView(context, vaccinationId);
}

/** Unopened vials back into a fridge of the site; past the product's time-out limit (or with none known) with a return hold. */
export async function returnVials(context: AppContext, actorId: number, vaccinationId: number, input: ReturnInput): Promise<RunView> {
  await context.sequelize.transaction(async (transaction) => {
    await lockForVials(vaccinationId, transaction);
    // Returns of one vaccination queue, so two at once cannot both give back the last vial out.
    await context.sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', { replacements: { key: `vaccination-return:${vaccinationId}` }, transaction });
    const facts = await loadFacts(vaccinationId, transaction);
    const out = (await loadLotsOut(context, vaccinationId, transaction)).find((l) => l.lotId === input.lotId);
    if (!out) throw AppError.unprocessable('No vials of that lot were issued for this vaccination.', [{ field: 'lotId', message: 'Not issued here.' }]);
    if (input.vials > out.out) throw AppError.unprocessable(`Only ${out.out} vials of lot ${out.lotNumber} are out.`, [{ field: 'vials', message: `At most ${out.out}.` }]);
    const toFridgeId = input.toFridgeId ?? out.fromFridgeId;
    if (!(await Fridge.findOne({ where: { id: toFridgeId, siteId: facts.site.id }, transaction }))) {
      throw AppError.unprocessable('That fridge is not on this site.', [{ field: 'toFridgeId', message: 'Not on this site.' }]);
    }
    const at = input.at ? new Date(input.at) : new Date();
    const leftAt = new Date(out.leftAt);
    if (at < leftAt || at.getTime() > Date.now() + 5 * 60_000) {
      throw AppError.unprocessable('The return time must be after the vials left and not in the future.', [{ field: 'at', message: 'Out of range.' }]);
    }
    const check = checkReturn(leftAt.getTime(), at.getTime(), facts.product.timeOutLimitMinutes ?? null);
    const movement = await postMovement(
      { lotId: input.lotId, kind: 'return', vials: input.vials, toFridgeId, leftAt, at, sourceKind: 'vaccination', sourceId: vaccinationId, reason: `unopened, ${Math.round(check.minutesOut)} minutes out`, recordedBy: actorId },
      transaction,
    );
    if (check.holdReason) {
      await openHold({ lotId: input.lotId, cause: 'return', sourceKind: 'vaccination', sourceId: vaccinationId, reason: check.holdReason, openedBy: actorId }, transaction);
    }
    await recordAudit(
      { actorId, action: 'vaccination.return', entity: 'vaccination', entityId: vaccinationId, after: { movementId: movement.id, lotId: input.lotId, toFridgeId, vials: input.vials, minutesOut: check.minutesOut, hold: check.holdReason } },
      transaction,
    );
  });
  return loadRunView(context, vaccinationId);
}
