// The catalogue: everyone signed in reads it; purchasing and admins keep it; receiving proposes from an unknown barcode.
import { z } from 'zod';
import { presentationInputSchema, presentationProposalSchema } from '../../shared/catalogue/presentation-schemas.js';
import { productInputSchema } from '../../shared/catalogue/product-schemas.js';
import { supplierInputSchema } from '../../shared/catalogue/supplier-schemas.js';
import type { AppContext } from '../app-context.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { parseInput } from '../http/validate.js';
import { proposePresentation } from './presentation-proposals.js';
import { addPresentation, listProducts, saveProduct, updatePresentation } from './products-service.js';
import { listSuppliers, saveSupplier } from './suppliers-service.js';

const presentationUpdateSchema = presentationInputSchema.and(z.object({ productId: z.number().int().positive().optional() }));

export function catalogueRoutes(context: AppContext) {
  const router = createSecureRouter('/api/catalogue');
  const keepers = { roles: ['admin', 'purchasing'] } as const;
  const reader = { roles: 'signed-in' } as const;

  router.get('/products', reader, async (_req, res) => {
    res.json({ items: await listProducts() });
  });

  router.post('/products', keepers, async (req, res) => {
    res.status(201).json(await saveProduct(context, req.user!.id, null, parseInput(productInputSchema, req.body, 'product')));
  });

  router.put('/products/:productId', keepers, async (req, res) => {
    const input = parseInput(productInputSchema, req.body, 'product');
    res.json(await saveProduct(context, req.user!.id, parseIdParam(req.params.productId), input));
  });

  router.post('/products/:productId/presentations', keepers, async (req, res) => {
    const input = parseInput(presentationInputSchema, req.body, 'presentation');
    res.status(201).json(await addPresentation(context, req.user!.id, parseIdParam(req.params.productId), input));
  });

  router.put('/presentations/:presentationId', keepers, async (req, res) => {
    const input = parseInput(presentationUpdateSchema, req.body, 'presentation');
    res.json(await updatePresentation(context, req.user!.id, parseIdParam(req.params.presentationId), input));
  });

  router.post('/proposals', { roles: ['admin', 'purchasing', 'receiving'] }, async (req, res) => {
    const proposal = parseInput(presentationProposalSchema, req.body, 'proposal');
    res.status(201).json(await proposePresentation(context, req.user!.id, proposal));
  });

  router.get('/suppliers', reader, async (_req, res) => {
    res.json({ items: await listSuppliers() });
  });

  router.post('/suppliers', keepers, async (req, res) => {
    res.status(201).json(await saveSupplier(context, req.user!.id, null, parseInput(supplierInputSchema, req.body, 'supplier')));
  });

  router.put('/suppliers/:supplierId', keepers, async (req, res) => {
    const input = parseInput(supplierInputSchema, req.body, 'supplier');
    res.json(await saveSupplier(context, req.user!.id, parseIdParam(req.params.supplierId), input));
  });

  return router;
}
