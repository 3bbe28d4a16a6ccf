// Writes an audit entry inside the caller's transaction, so the entry and the change land together or not at all.
import type { Transaction } from 'sequelize';
import { AuditEntry } from '../../database/models/index.js';

export interface AuditChange {
  actorId: number | null;
  action: string;
  entity: string;
  entityId?: string | number | null;
  before?: unknown;
  after?: unknown;
}

/** Fields never written to the audit log. */
const secretFields = new Set(['passwordHash', 'password_hash', 'password']);

function withoutSecrets(value: unknown): unknown {
  if (!value || typeof value !== 'object') return value ?? null;
  return Object.fromEntries(Object.entries(value).filter(([key]) => !secretFields.has(key)));
}

export async function recordAudit(change: AuditChange, transaction: Transaction): Promise<void> {
  await AuditEntry.create(
    {
      actorId: change.actorId,
      action: change.action,
      entity: change.entity,
      entityId: change.entityId == null ? null : String(change.entityId),
      before: withoutSecrets(change.before),
      after: withoutSecrets(change.after),
    },
    { transaction },
  );
}
