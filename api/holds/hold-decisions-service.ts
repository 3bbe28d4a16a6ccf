// The veterinarian's decision on a hold: signed by re-entering the password, never changed, superseded by a correction;
// a discard empties the lot from every fridge in the same transaction.
import { QueryTypes } from 'sequelize';
import { signatureMeaning, type HoldDecisionKind } from '../../shared/lots/lot-status.js';
import { Hold, HoldDecision, StockBalance, User } from '../../database/models/index.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { postMovement } from '../lots/stock-ledger.js';
import { notifyHoldDecided } from '../notifications/hold-notifications.js';
import { updateExcursionReviewStatus } from './excursion-review-status.js';

export interface DecisionInput {
  decision: HoldDecisionKind;
  condition: string;
  notes: string;
  password: string;
  supersedesId: number | null;
}

export interface DecisionView {
  id: number;
  holdId: number;
  decision: HoldDecisionKind;
  condition: string;
  notes: string;
  signerName: string;
  signedAt: string;
  signatureMeaning: string;
  supersedesId: number | null;
  current: boolean;
}

export function toDecisionView(row: HoldDecision, supersededIds: Set<number>): DecisionView {
  return {
    id: row.id,
    holdId: row.holdId,
    decision: row.decision,
    condition: row.condition,
    notes: row.notes,
    signerName: row.signerName,
    signedAt: row.signedAt.toISOString(),
    signatureMeaning: row.signatureMeaning,
    supersedesId: row.supersedesId,
    current: !supersededIds.has(row.id),
  };
}

/** The site a hold belongs to for access: where its lot was first received. */
export async function holdSiteId(holdId: number): Promise<number | null> {
  const [row] = await Hold.sequelize!.query<{ site_id: number }>(
    `SELECT f.site_id FROM holds h JOIN stock_movements m ON m.lot_id = h.lot_id
       JOIN fridges f ON f.id = coalesce(m.to_fridge_id, m.from_fridge_id)
     WHERE h.id = :holdId ORDER BY m.at, m.id LIMIT 1`,
    { replacements: { holdId }, type: QueryTypes.SELECT },
  );
  return row?.site_id ?? null;
}

export async function decideHold(context: AppContext, signerId: number, holdId: number, input: DecisionInput): Promise<DecisionView> {
  const signer = await User.findByPk(signerId);
  if (!signer || !(await context.hasher.verify(input.password, signer.passwordHash))) {
    throw AppError.badRequest('The password is not right, so the decision was not signed.', [{ field: 'password', message: 'Not right.' }]);
  }
  return context.sequelize.transaction(async (transaction) => {
    const hold = await Hold.findByPk(holdId, { transaction });
    if (!hold) throw AppError.notFound('No such hold.');
    // Holds are append-only for the application (no row lock without UPDATE rights): decisions on one hold queue here.
    await context.sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', { replacements: { key: `hold:${holdId}` }, transaction });
    const decisions = await HoldDecision.findAll({ where: { holdId }, transaction });
    const superseded = new Set(decisions.map((d) => d.supersedesId).filter((id): id is number => id !== null));
    const current = decisions.find((d) => !superseded.has(d.id)) ?? null;
    if (current && input.supersedesId !== current.id) {
      throw AppError.conflict('This hold already has a signed decision; a correction must say it supersedes that decision.', [
        { field: 'supersedesId', message: `Supersede decision ${current.id}.` },
      ]);
    }
    if (!current && input.supersedesId !== null) {
      throw AppError.badRequest('There is no decision to supersede yet.', [{ field: 'supersedesId', message: 'Nothing to supersede.' }]);
    }
    const row = await HoldDecision.create(
      {
        holdId,
        decision: input.decision,
        condition: input.decision === 'release_with_condition' ? input.condition.trim() : '',
        notes: input.notes.trim(),
        signedBy: signer.id,
        signerName: signer.name,
        signatureMeaning,
        supersedesId: input.supersedesId,
      },
      { transaction },
    );
    if (input.decision === 'discard') {
      const balances = await StockBalance.findAll({ where: { lotId: hold.lotId }, transaction });
      for (const balance of balances.filter((b) => b.vials > 0)) {
        await postMovement(
          { lotId: hold.lotId, kind: 'discard', vials: balance.vials, fromFridgeId: balance.fridgeId, at: new Date(), sourceKind: 'hold_decision', sourceId: row.id, reason: 'decided by the veterinarian', recordedBy: signer.id },
          transaction,
        );
      }
    }
    const view = toDecisionView(row, new Set());
    await notifyHoldDecided(transaction, hold, { id: row.id, decision: row.decision, condition: row.condition, signerName: row.signerName });
    await updateExcursionReviewStatus(context.sequelize, transaction, hold, signer.id);
    await recordAudit({ actorId: signer.id, action: 'hold.decide', entity: 'hold', entityId: holdId, before: current ? toDecisionView(current, new Set()) : null, after: view }, transaction);
    return view;
  });
}

export async function holdDecisions(holdId: number): Promise<DecisionView[]> {
  const rows = await HoldDecision.findAll({ where: { holdId }, order: [['signedAt', 'ASC'], ['id', 'ASC']] });
  const superseded = new Set(rows.map((d) => d.supersedesId).filter((id): id is number => id !== null));
  return rows.map((row) => toDecisionView(row, superseded));
}
