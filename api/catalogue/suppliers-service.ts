// Suppliers: listed for everyone who orders or receives, changed by purchasing and admins.
import { Supplier } from '../../database/models/index.js';
import type { SupplierInput, SupplierView } from '../../shared/catalogue/supplier-schemas.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { toSupplierView } from './catalogue-views.js';

export async function listSuppliers(): Promise<SupplierView[]> {
  return (await Supplier.findAll({ order: [['name', 'ASC']] })).map(toSupplierView);
}

export async function saveSupplier(context: AppContext, actorId: number, id: number | null, input: SupplierInput): Promise<SupplierView> {
  return context.sequelize.transaction(async (transaction) => {
    const clash = await Supplier.findOne({ where: { name: input.name }, transaction });
    if (clash && clash.id !== id) throw AppError.conflict('Another supplier has this name.', [{ field: 'name', message: 'Already in use.' }]);
    if (id === null) {
      const supplier = await Supplier.create(input, { transaction });
      await recordAudit({ actorId, action: 'supplier.create', entity: 'supplier', entityId: supplier.id, after: toSupplierView(supplier) }, transaction);
      return toSupplierView(supplier);
    }
    const supplier = await Supplier.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
    if (!supplier) throw AppError.notFound('No such supplier.');
    const before = toSupplierView(supplier);
    await supplier.update(input, { transaction });
    await recordAudit({ actorId, action: 'supplier.update', entity: 'supplier', entityId: id, before, after: toSupplierView(supplier) }, transaction);
    return toSupplierView(supplier);
  });
}
