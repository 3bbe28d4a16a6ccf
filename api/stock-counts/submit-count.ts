// Submits a fridge's count: every difference posts an adjust movement in one transaction; a sheet that no longer
// matches the ledger (vials moved since it was opened) is refused so the counter reloads and counts again.
import { QueryTypes } from 'sequelize';
import { Fridge, StockCount, StockCountLine } from '../../database/models/index.js';
import { countAdjustments, countLineProblems } from '../../shared/lots/count-lines.js';
import type { StockCountInput } from '../../shared/lots/count-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { postMovement } from '../lots/stock-ledger.js';

export interface CountResult {
  id: number;
  adjustments: number;
}

const stale = (fields: { field: string; message: string }[]) =>
  AppError.conflict('Vials in this fridge changed since the sheet was opened: reload the sheet and count again.', fields);

async function balancesOf(context: AppContext, fridgeId: number, transaction: import('sequelize').Transaction): Promise<Map<number, number>> {
  const rows = await context.sequelize.query<{ lot_id: number; vials: number }>('SELECT lot_id, vials FROM stock_balances WHERE fridge_id = :fridgeId', {
    replacements: { fridgeId },
    type: QueryTypes.SELECT,
    transaction,
  });
  return new Map(rows.map((r) => [r.lot_id, r.vials]));
}

export async function submitCount(context: AppContext, actorId: number, fridgeId: number, input: StockCountInput, now = new Date()): Promise<CountResult> {
  const problems = countLineProblems(input.lines);
  if (problems.length) {
    const fields = problems.map((p) => ({ field: `lines.${p.index}.${p.field}`, message: p.message }));
    throw AppError.badRequest(`The count is not valid: ${fields.map((f) => `${f.field}: ${f.message}`).join('; ')}`, fields);
  }
  return context.sequelize.transaction(async (transaction) => {
    const fridge = await Fridge.findByPk(fridgeId, { transaction });
    if (!fridge) throw AppError.notFound('No such fridge.');
    // Two counts of one fridge queue here; other movements are caught by the re-check after the adjustments.
    await context.sequelize.query('SELECT pg_advisory_xact_lock(hashtext(:key))', { replacements: { key: `stock-count:${fridgeId}` }, transaction });
    const balances = await balancesOf(context, fridgeId, transaction);
    const changed = input.lines.flatMap((line, index) => {
      if (!balances.has(line.lotId)) return [{ field: `lines.${index}.lotId`, message: 'This lot was never in this fridge.' }];
      return balances.get(line.lotId) !== line.expected ? [{ field: `lines.${index}.expected`, message: `Now ${balances.get(line.lotId)} vials.` }] : [];
    });
    if (changed.some((f) => f.field.endsWith('lotId'))) throw AppError.badRequest('A lot on the count is not in this fridge.', changed.filter((f) => f.field.endsWith('lotId')));
    const listed = new Set(input.lines.map((l) => l.lotId));
    const missing = [...balances].filter(([lotId, vials]) => vials > 0 && !listed.has(lotId));
    if (changed.length || missing.length) throw stale([...changed, ...(missing.length ? [{ field: 'lines', message: `${missing.length} lot(s) arrived since the sheet was opened.` }] : [])]);

    const count = await StockCount.create({ fridgeId, countedBy: actorId, countedAt: now, notes: input.notes }, { transaction });
    for (const line of input.lines) {
      await StockCountLine.create({ stockCountId: count.id, lotId: line.lotId, expected: line.expected, counted: line.counted, reason: line.reason.trim() }, { transaction, fields: ['stockCountId', 'lotId', 'expected', 'counted', 'reason'] });
    }
    const adjustments = countAdjustments(input.lines);
    for (const adjustment of adjustments) {
      await postMovement(
        {
          lotId: adjustment.lotId, kind: 'adjust', vials: adjustment.vials,
          fromFridgeId: adjustment.direction === 'out' ? fridgeId : null, toFridgeId: adjustment.direction === 'in' ? fridgeId : null,
          at: now, sourceKind: 'stock_count', sourceId: count.id, reason: adjustment.reason, recordedBy: actorId,
        },
        transaction,
      );
    }
    // The adjustments row-locked their balances: if one moved between the check and now, it no longer equals the count.
    const after = await balancesOf(context, fridgeId, transaction);
    const drifted = input.lines.flatMap((line, index) => (after.get(line.lotId) !== line.counted ? [{ field: `lines.${index}.expected`, message: 'Changed while counting.' }] : []));
    if (drifted.length) throw stale(drifted);
    await recordAudit({ actorId, action: 'stock.count', entity: 'fridge', entityId: fridgeId, after: { countId: count.id, lines: input.lines, notes: input.notes } }, transaction);
    return { id: count.id, adjustments: adjustments.length };
  });
}
