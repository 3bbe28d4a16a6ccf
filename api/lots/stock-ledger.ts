// Posts stock movements: the only way stock changes. The database keeps balances and refuses any below zero.
import type { Transaction } from 'sequelize';
import { StockMovement } from '../../database/models/index.js';
import type { MovementKind } from '../../shared/lots/movement-kinds.js';
import { AppError } from '../http/app-error.js';

export interface MovementInput {
  lotId: number;
  kind: MovementKind;
  vials: number;
  fromFridgeId?: number | null;
  toFridgeId?: number | null;
  leftAt?: Date | null;
  at: Date;
  sourceKind: string;
  sourceId: number | null;
  reason?: string;
  recordedBy: number | null;
}

interface PgError {
  original?: { code?: string; constraint?: string };
  parent?: { code?: string; constraint?: string };
}

export function isNegativeBalanceError(error: unknown): boolean {
  const pg = (error as PgError)?.original ?? (error as PgError)?.parent;
  return pg?.code === '23514' && pg.constraint === 'stock_balances_vials_check';
}

export async function postMovement(movement: MovementInput, transaction: Transaction): Promise<StockMovement> {
  try {
    return await StockMovement.create(
      {
        lotId: movement.lotId,
        kind: movement.kind,
        vials: movement.vials,
        fromFridgeId: movement.fromFridgeId ?? null,
        toFridgeId: movement.toFridgeId ?? null,
        leftAt: movement.leftAt ?? null,
        at: movement.at,
        sourceKind: movement.sourceKind,
        sourceId: movement.sourceId,
        reason: movement.reason ?? '',
        recordedBy: movement.recordedBy,
      },
      { transaction },
    );
  } catch (error) {
    if (isNegativeBalanceError(error)) {
      throw AppError.conflict('There are not that many vials of this lot in that fridge.', [{ field: 'vials', message: 'More than the fridge holds.' }]);
    }
    throw error;
  }
}
