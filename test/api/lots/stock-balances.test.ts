// The ledger: balances are derived from movements by the database, never go below zero under concurrency, and records stay.
import { expect } from 'chai';
import { Sequelize } from 'sequelize';
import { Lot, StockMovement } from '../../../database/models/index.js';
import { resetDatabase, testEnv } from '../../support/test-database.js';
import { createSite, signInAs, testContext } from '../../support/test-app.js';
import { createCatalogue, createFridge, lineInput, postShipment, shipmentInput } from '../../support/receiving-fixtures.js';
import { balanceOf, clearPhotoFiles, movementSum } from '../../support/receiving-state.js';
import { postMovement } from '../../../api/lots/stock-ledger.js';
import { AppError } from '../../../api/http/app-error.js';

describe('stock balances', () => {
  beforeEach(async () => {
    await resetDatabase();
    clearPhotoFiles();
  });

  async function lotInFridge(vials: number) {
    const site = await createSite('NORTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const other = await createFridge(site, 'NORTH-F2');
    const { presentation } = await createCatalogue();
    const lot = await Lot.create({ presentationId: presentation.id, lotNumber: 'LEDGER1', expiry: '2028-01-31', createdBy: null });
    await testContext().sequelize.transaction((transaction) =>
      postMovement({ lotId: lot.id, kind: 'receive', vials, toFridgeId: fridge.id, at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null }, transaction),
    );
    return { site, fridge, other, lot };
  }

  it('20 concurrent receipts of one new lot into one fridge make one lot whose balance is their sum', async function () {
    this.timeout(60_000);
    const site = await createSite('NORTH');
    const fridge = await createFridge(site, 'NORTH-F1');
    const { presentation } = await createCatalogue();
    const clerk = await signInAs(['receiving'], [site]);
    const responses = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        postShipment(clerk, site.id, shipmentInput([lineInput({ presentationId: presentation.id, fridgeId: fridge.id, lotNumber: 'RUSH1', expiry: '2028-06-30', expected: i + 1 })])),
      ),
    );
    expect(responses.map((r) => r.status)).to.deep.equal(Array(20).fill(201));
    expect(await Lot.count()).to.equal(1);
    const lot = (await Lot.findOne())!;
    // 1 + 2 + ... + 20 = 210 (hand-computed).
    expect(await balanceOf(lot.id, fridge.id)).to.equal(210);
    expect(await movementSum(lot.id, fridge.id)).to.equal(210);
  });

  it('30 concurrent takings of one vial from a lot with 10: exactly 10 succeed, the balance ends at 0, never below', async function () {
    this.timeout(60_000);
    const { fridge, lot } = await lotInFridge(10);
    // Separate connections, so the takings really run side by side in the database.
    const sequelize = new Sequelize(testEnv('DATABASE_URL'), { logging: false, pool: { max: 30 } });
    try {
      const outcomes = await Promise.allSettled(
        Array.from({ length: 30 }, () =>
          sequelize.transaction(async (transaction) => {
            await sequelize.query(
              `INSERT INTO stock_movements (lot_id, kind, vials, from_fridge_id, at, source_kind) VALUES (:lotId, 'discard', 1, :fridgeId, now(), 'test')`,
              { replacements: { lotId: lot.id, fridgeId: fridge.id }, transaction },
            );
            await new Promise((resolve) => setTimeout(resolve, 5));
          }),
        ),
      );
      const refused = outcomes.filter((o): o is PromiseRejectedResult => o.status === 'rejected');
      expect(outcomes.length - refused.length).to.equal(10);
      for (const failure of refused) expect((failure.reason as { original?: { constraint?: string } }).original?.constraint).to.equal('stock_balances_vials_check');
    } finally {
      await sequelize.close();
    }
    expect(await balanceOf(lot.id, fridge.id)).to.equal(0);
    expect(await movementSum(lot.id, fridge.id)).to.equal(0);
  });

  it('a taking from a fridge that never held the lot is refused as a conflict', async () => {
    const { other, lot } = await lotInFridge(5);
    let error: unknown;
    try {
      await testContext().sequelize.transaction((transaction) =>
        postMovement({ lotId: lot.id, kind: 'issue', vials: 1, fromFridgeId: other.id, at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null }, transaction),
      );
    } catch (caught) {
      error = caught;
    }
    expect(error).to.be.instanceOf(AppError);
    expect((error as AppError).status).to.equal(409);
    expect(await StockMovement.count()).to.equal(1);
  });

  it('a transfer moves vials between fridges and keeps both balances', async () => {
    const { fridge, other, lot } = await lotInFridge(10);
    await testContext().sequelize.transaction((transaction) =>
      postMovement({ lotId: lot.id, kind: 'transfer', vials: 4, fromFridgeId: fridge.id, toFridgeId: other.id, leftAt: new Date(Date.now() - 60_000), at: new Date(), sourceKind: 'test', sourceId: null, recordedBy: null }, transaction),
    );
    expect([await balanceOf(lot.id, fridge.id), await balanceOf(lot.id, other.id)]).to.deep.equal([6, 4]);
  });

  it('the application role cannot change or remove a movement, nor write a balance directly (SQLSTATE 42501)', async () => {
    const { fridge, lot } = await lotInFridge(3);
    const sequelize = testContext().sequelize;
    for (const sql of [
      'UPDATE stock_movements SET vials = 99',
      'DELETE FROM stock_movements',
      `UPDATE stock_balances SET vials = 99`,
      `INSERT INTO stock_balances (lot_id, fridge_id, vials) VALUES (${lot.id}, ${fridge.id}, 5)`,
      'DELETE FROM holds',
    ]) {
      let code: string | undefined;
      try {
        await sequelize.query(sql);
      } catch (error) {
        code = (error as { original?: { code?: string } }).original?.code;
      }
      expect(code, sql).to.equal('42501');
    }
    expect(await balanceOf(lot.id, fridge.id)).to.equal(3);
  });

  it('the database refuses a movement whose sides do not fit its kind, and zero or negative vials', async () => {
    const { fridge, lot } = await lotInFridge(3);
    const sequelize = testContext().sequelize;
    for (const sql of [
      `INSERT INTO stock_movements (lot_id, kind, vials, from_fridge_id, at, source_kind) VALUES (${lot.id}, 'receive', 1, ${fridge.id}, now(), 'test')`,
      `INSERT INTO stock_movements (lot_id, kind, vials, to_fridge_id, at, source_kind) VALUES (${lot.id}, 'receive', 0, ${fridge.id}, now(), 'test')`,
      `INSERT INTO stock_movements (lot_id, kind, vials, to_fridge_id, at, source_kind) VALUES (${lot.id}, 'receive', -2, ${fridge.id}, now(), 'test')`,
    ]) {
      let code: string | undefined;
      try {
        await sequelize.query(sql);
      } catch (error) {
        code = (error as { original?: { code?: string } }).original?.code;
      }
      expect(code, sql).to.equal('23514');
    }
  });
});
