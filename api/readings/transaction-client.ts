// The pg client under a Sequelize transaction, for COPY (which Sequelize cannot run) inside that same transaction.
import type pg from 'pg';
import type { Transaction } from 'sequelize';

/** Sequelize 6 keeps the transaction's connection on an undocumented field; we check its shape rather than trust it. */
export function transactionClient(transaction: Transaction): pg.ClientBase {
  const connection = (transaction as unknown as { connection?: pg.ClientBase }).connection;
  if (!connection || typeof connection.query !== 'function') throw new Error('the transaction has no pg connection');
  return connection;
}
