// Who may use the fridge-log routes, and which site a fridge-log record belongs to (for the access guard's siteOf).
import type { Request } from 'express';
import { QueryTypes } from 'sequelize';
import type { Role } from '../../shared/auth/roles.js';
import { Fridge } from '../../database/models/index.js';

/** Fridges, loggers, log imports and daily checks: admins and storage staff change them, veterinarians read them. */
export const fridgeReaders = { roles: ['admin', 'storage', 'veterinarian'] as readonly Role[] };
export const fridgeWriters = { roles: ['admin', 'storage'] as readonly Role[] };

type IdSource = (req: Request) => unknown;

function positiveId(value: unknown): number | undefined {
  const text = Array.isArray(value) ? value[0] : value;
  if (typeof text === 'number') return Number.isInteger(text) && text > 0 && text <= 2_147_483_647 ? text : undefined;
  if (typeof text !== 'string' || !/^[1-9]\d{0,9}$/.test(text) || Number(text) > 2_147_483_647) return undefined;
  return Number(text);
}

async function siteBySql(sql: string, id: number | undefined): Promise<number | undefined> {
  if (id === undefined) return undefined;
  const rows = await Fridge.sequelize!.query<{ site_id: number }>(sql, { replacements: { id }, type: QueryTypes.SELECT });
  return rows[0]?.site_id;
}

export const fromParam = (name: string): IdSource => (req) => req.params[name];
export const fromBody = (name: string): IdSource => (req) => (req.body as Record<string, unknown> | undefined)?.[name];

export const siteOfSite = (source: IdSource) => async (req: Request) => positiveId(source(req));

export const siteOfFridge = (source: IdSource) => (req: Request) =>
  siteBySql('SELECT site_id FROM fridges WHERE id = :id', positiveId(source(req)));

export const siteOfLogger = (source: IdSource) => (req: Request) =>
  siteBySql('SELECT f.site_id FROM loggers l JOIN fridges f ON f.id = l.fridge_id WHERE l.id = :id', positiveId(source(req)));

export const siteOfLogImport = (source: IdSource) => (req: Request) =>
  siteBySql(
    'SELECT f.site_id FROM log_imports i JOIN loggers l ON l.id = i.logger_id JOIN fridges f ON f.id = l.fridge_id WHERE i.id = :id',
    positiveId(source(req)),
  );

export const siteOfExcursion = (source: IdSource) => (req: Request) =>
  siteBySql('SELECT f.site_id FROM excursions e JOIN fridges f ON f.id = e.fridge_id WHERE e.id = :id', positiveId(source(req)));

/** The id a siteOf already vouched for; a malformed one never reaches here (the guard answers 404). */
export function idFrom(value: unknown): number {
  const id = positiveId(value);
  if (id === undefined) throw new RangeError('id not checked by the access guard');
  return id;
}
