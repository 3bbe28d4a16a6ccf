// Storage staff discard vials themselves: expired, damaged, or another stated reason. A held lot waits for the
// veterinarian (whose discard decision posts its own movement), except vials that are physically damaged.
import { Fridge, Lot } from '../../database/models/index.js';
import { discardReasonLabels } from '../../shared/lots/discard-reasons.js';
import type { DiscardInput } from '../../shared/lots/movement-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { canSeeSite } from '../http/access.js';
import { AppError } from '../http/app-error.js';
import { undecidedHoldsByLot } from './holds.js';
import { postMovement } from './stock-ledger.js';

export interface DiscardResult {
  movementId: number;
}

export async function discardVials(context: AppContext, user: Express.User, lotId: number, input: DiscardInput, now = new Date()): Promise<DiscardResult> {
  return context.sequelize.transaction(async (transaction) => {
    const lot = await Lot.findByPk(lotId, { transaction });
    if (!lot) throw AppError.notFound('No such lot.');
    const fridge = await Fridge.findByPk(input.fridgeId, { transaction });
    if (!fridge || !canSeeSite(user, fridge.siteId)) throw AppError.badRequest('No such fridge on your sites.', [{ field: 'fridgeId', message: 'Unknown fridge.' }]);
    const holds = (await undecidedHoldsByLot([lotId], transaction)).get(lotId) ?? [];
    if (holds.length && input.reason !== 'damaged') {
      throw AppError.conflict('This lot is on hold: keep it in the fridge; the veterinarian decides whether it is discarded.', [
        { field: 'reason', message: 'Only damaged vials of a held lot may be discarded here.' },
      ]);
    }
    const reason = input.reasonText ? `${input.reason}: ${input.reasonText}` : input.reason;
    const movement = await postMovement(
      { lotId, kind: 'discard', vials: input.vials, fromFridgeId: fridge.id, at: now, sourceKind: 'discard', sourceId: null, reason, recordedBy: user.id },
      transaction,
    );
    await recordAudit(
      { actorId: user.id, action: 'stock.discard', entity: 'lot', entityId: lotId, after: { movementId: Number(movement.id), fridgeId: fridge.id, vials: input.vials, reason: input.reason, label: discardReasonLabels[input.reason], reasonText: input.reasonText } },
      transaction,
    );
    return { movementId: Number(movement.id) };
  });
}
