// Products and their presentations: the catalogue everyone reads and purchasing or admins keep.
import type { Transaction } from 'sequelize';
import { Presentation, Product, User } from '../../database/models/index.js';
import type { ProductInput, ProductView } from '../../shared/catalogue/product-schemas.js';
import type { PresentationInput, PresentationView } from '../../shared/catalogue/presentation-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { toPresentationView, toProductView } from './catalogue-views.js';
import { assertGtinsFree } from './gtin-uniqueness.js';

async function proposerNames(rows: { proposedBy: number | null }[], transaction?: Transaction): Promise<Map<number, string>> {
  const ids = [...new Set(rows.map((row) => row.proposedBy).filter((id): id is number => id !== null))];
  if (!ids.length) return new Map();
  const users = await User.findAll({ where: { id: ids }, attributes: ['id', 'name'], transaction });
  return new Map(users.map((user) => [user.id, user.name]));
}

export async function loadProductView(id: number, transaction?: Transaction): Promise<ProductView> {
  const product = await Product.findByPk(id, { include: [{ model: Presentation, as: 'presentations' }], transaction });
  if (!product) throw AppError.notFound('No such product.');
  return toProductView(product, await proposerNames([product, ...(product.presentations ?? [])], transaction));
}

export async function listProducts(): Promise<ProductView[]> {
  const products = await Product.findAll({ include: [{ model: Presentation, as: 'presentations' }], order: [['name', 'ASC'], ['id', 'ASC']] });
  const names = await proposerNames(products.flatMap((p) => [p, ...(p.presentations ?? [])]));
  return products.map((product) => toProductView(product, names));
}

async function assertNameFree(input: { name: string; maker: string }, exceptId: number | null, transaction: Transaction): Promise<void> {
  const [rows] = await Product.sequelize!.query(
    'SELECT id FROM products WHERE lower(name) = lower(:name) AND lower(maker) = lower(:maker) AND id <> :exceptId',
    { replacements: { name: input.name, maker: input.maker, exceptId: exceptId ?? 0 }, transaction },
  );
  if ((rows as unknown[]).length) throw AppError.conflict('A product with this name and maker exists.', [{ field: 'name', message: 'Already in the catalogue.' }]);
}

export async function saveProduct(context: AppContext, actorId: number, id: number | null, input: ProductInput): Promise<ProductView> {
  return context.sequelize.transaction(async (transaction) => {
    await assertNameFree(input, id, transaction);
    if (id === null) {
      const product = await Product.create({ ...input, status: 'confirmed', proposedBy: null }, { transaction });
      const view = await loadProductView(product.id, transaction);
      await recordAudit({ actorId, action: 'product.create', entity: 'product', entityId: product.id, after: view }, transaction);
      return view;
    }
    const product = await Product.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!product) throw AppError.notFound('No such product.');
    const before = await loadProductView(id, transaction);
    // Saving a proposed product in the catalogue form is its confirmation.
    await product.update({ ...input, status: 'confirmed' }, { transaction });
    const after = await loadProductView(id, transaction);
    await recordAudit({ actorId, action: 'product.update', entity: 'product', entityId: id, before, after }, transaction);
    return after;
  });
}

export async function addPresentation(context: AppContext, actorId: number, productId: number, input: PresentationInput): Promise<PresentationView> {
  return context.sequelize.transaction(async (transaction) => {
    const product = await Product.findByPk(productId, { transaction, lock: transaction.LOCK.SHARE });
    if (!product) throw AppError.notFound('No such product.');
    await assertGtinsFree(input, null, transaction);
    const presentation = await Presentation.create({ ...input, productId, status: 'confirmed', proposedBy: null, proposedAt: null }, { transaction });
    const view = toPresentationView(presentation);
    await recordAudit({ actorId, action: 'presentation.create', entity: 'presentation', entityId: presentation.id, after: view }, transaction);
    return view;
  });
}

/** Corrects a presentation and confirms it (a proposed one from receiving becomes part of the catalogue). */
export async function updatePresentation(context: AppContext, actorId: number, id: number, input: PresentationInput & { productId?: number }): Promise<PresentationView> {
  return context.sequelize.transaction(async (transaction) => {
    const presentation = await Presentation.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!presentation) throw AppError.notFound('No such presentation.');
    if (input.productId !== undefined && !(await Product.findByPk(input.productId, { transaction }))) {
      throw AppError.badRequest('No such product.', [{ field: 'productId', message: 'Unknown product.' }]);
    }
    await assertGtinsFree(input, id, transaction);
    const before = toPresentationView(presentation);
    await presentation.update({ ...input, status: 'confirmed' }, { transaction });
    const after = toPresentationView(presentation);
    await recordAudit({ actorId, action: 'presentation.update', entity: 'presentation', entityId: id, before, after }, transaction);
    return after;
  });
}
