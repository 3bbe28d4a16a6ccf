// Shapes a programme for the API: its steps in order with product names and ages in days, and how many flocks follow it.
import { Op, type Transaction } from 'sequelize';
import { Flock, Product, Programme, ProgrammeStep } from '../../database/models/index.js';
import type { ProgrammeView } from '../../shared/flocks/programme-schemas.js';
import { stepAgeDays } from '../../shared/flocks/step-age.js';

export const programmeIncludes = [{ model: ProgrammeStep, as: 'steps', include: [{ model: Product, as: 'product', attributes: ['id', 'name'] }] }];

async function flockCounts(ids: number[], transaction?: Transaction): Promise<Map<number, number>> {
  if (!ids.length) return new Map();
  const rows = (await Flock.count({ where: { programmeId: { [Op.in]: ids }, depletedOn: null }, group: ['programmeId'], transaction })) as unknown as {
    programmeId: number;
    count: number;
  }[];
  return new Map(rows.map((row) => [row.programmeId, Number(row.count)]));
}

export async function toProgrammeViews(programmes: Programme[], transaction?: Transaction): Promise<ProgrammeView[]> {
  const counts = await flockCounts(programmes.map((p) => p.id), transaction);
  return programmes.map((programme) => ({
    id: programme.id,
    name: programme.name,
    notes: programme.notes,
    active: programme.active,
    flockCount: counts.get(programme.id) ?? 0,
    steps: [...(programme.steps ?? [])]
      .sort((a, b) => a.position - b.position)
      .map((step) => ({
        id: step.id,
        position: step.position,
        productId: step.productId,
        productName: step.product?.name ?? '',
        ageValue: step.ageValue,
        ageUnit: step.ageUnit,
        ageDays: stepAgeDays(step),
        route: step.route,
        notes: step.notes,
      })),
  }));
}
