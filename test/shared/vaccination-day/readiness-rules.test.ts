// Each readiness rule decided from what the crew enters and what Vialyard computes, and what still blocks the start.
import { expect } from 'chai';
import { evaluateCheck, startBlockers, type RecordedCheck } from '../../../shared/vaccination-day/readiness-rules.js';
import { historyCsv, csvField } from '../../../shared/vaccination-day/history-csv.js';

const hour = 3_600_000;
const first = Date.UTC(2026, 11, 3, 6, 0);

describe('readiness rules', () => {
  it('12-hour rule (common practice): another farm 11 h before the first visit fails; 13 h before, or today’s own sites, pass', () => {
    const facts = { firstVisitAt: first, sheetSiteIds: [4] };
    expect(evaluateCheck('twelve_hour', { visits: [{ siteId: null, at: first - 11 * hour, label: 'a hatchery' }] }, facts)).to.include({ passed: false });
    expect(evaluateCheck('twelve_hour', { visits: [{ siteId: null, at: first - 13 * hour }] }, facts).passed).to.equal(true);
    expect(evaluateCheck('twelve_hour', { visits: [{ siteId: 4, at: first - 2 * hour }] }, facts).passed).to.equal(true);
    expect(evaluateCheck('twelve_hour', { visits: [{ siteId: 9, at: first - 2 * hour }] }, facts).passed).to.equal(false);
  });

  it('hygiene and protective equipment (common practice) pass only when every item is confirmed, naming what is missing', () => {
    const hygiene = evaluateCheck('hygiene', { showered: true, cleanClothes: true }, {});
    expect(hygiene).to.deep.equal({ passed: false, message: 'Not confirmed: Sanitized boots or boot covers.' });
    expect(evaluateCheck('hygiene', { showered: true, cleanClothes: true, bootsSanitized: true }, {}).passed).to.equal(true);
    const ppe = evaluateCheck('ppe', { hairnet: true, mask: true, eyeProtection: true, gloves: true, longSleeves: true, boots: 'yes' }, {});
    expect(ppe.passed, 'a string is not a confirmation').to.equal(false);
    for (const kind of ['flock_health', 'water_treatments', 'battery'] as const) expect(evaluateCheck(kind, {}, {}).passed, kind).to.equal(false);
  });

  it('withdrawal (common practice: never within 21 days before slaughter) follows the computed status', () => {
    expect(evaluateCheck('withdrawal', {}, { withdrawalBlocks: true, withdrawalDays: 21, daysBeforeDepletion: 20 })).to.deep.equal({
      passed: false,
      message: 'Only 20 days before depletion, inside the 21-day withdrawal period.',
    });
    expect(evaluateCheck('withdrawal', {}, { withdrawalBlocks: false, withdrawalDays: 21, daysBeforeDepletion: 21 }).passed).to.equal(true);
    expect(evaluateCheck('withdrawal', {}, { withdrawalBlocks: false, withdrawalDays: 21, daysBeforeDepletion: null }).message).to.equal('No depletion date set.');
  });

  it('heat (common practice: spray at night in summer) fails above the site limit, across units; no limit set passes with a word', () => {
    // Hand-computed: 31 °C = 87.8 °F > 86 °F; 86 °F is not above 86 °F.
    expect(evaluateCheck('heat', { expectedTemperature: { value: 31, unit: 'C' } }, { heatLimitF: 86 }).passed).to.equal(false);
    expect(evaluateCheck('heat', { expectedTemperature: { value: 86, unit: 'F' } }, { heatLimitF: 86 }).passed).to.equal(true);
    expect(evaluateCheck('heat', {}, { heatLimitF: 86 }).passed, 'nothing entered').to.equal(false);
    expect(evaluateCheck('heat', { expectedTemperature: { value: 99, unit: 'F' } }, { heatLimitF: null }).message).to.match(/No heat limit/);
  });

  it('enough vaccine needs the equipment confirmed and no shortfall in the site’s fridges', () => {
    expect(evaluateCheck('enough_vaccine', { equipmentAssembled: true }, { shortfallDoses: 0 }).passed).to.equal(true);
    expect(evaluateCheck('enough_vaccine', { equipmentAssembled: true }, { shortfallDoses: 500 }).message).to.match(/500 doses short/);
    expect(evaluateCheck('enough_vaccine', {}, { shortfallDoses: 0 }).passed).to.equal(false);
  });

  it('blocks the start on missing checks, on failed ones, and not once a veterinarian overrode them; the latest record counts', () => {
    const passedAll = (memberId: number): RecordedCheck[] =>
      (['twelve_hour', 'hygiene', 'ppe'] as const).map((kind, i) => ({ id: memberId * 10 + i, kind, memberId, passed: true, overridden: false }));
    const vaccinationChecks: RecordedCheck[] = (['flock_health', 'withdrawal', 'water_treatments', 'heat', 'battery', 'enough_vaccine'] as const).map((kind, i) => ({
      id: 100 + i, kind, memberId: null, passed: true, overridden: false,
    }));
    expect(startBlockers([1, 2], [...passedAll(1), ...vaccinationChecks])).to.deep.equal([
      { kind: 'twelve_hour', memberId: 2, why: 'missing' }, { kind: 'hygiene', memberId: 2, why: 'missing' }, { kind: 'ppe', memberId: 2, why: 'missing' },
    ]);
    const failedLater = { id: 200, kind: 'heat' as const, memberId: null, passed: false, overridden: false };
    expect(startBlockers([1], [...passedAll(1), ...vaccinationChecks, failedLater])).to.deep.equal([{ kind: 'heat', memberId: null, why: 'failed' }]);
    expect(startBlockers([1], [...passedAll(1), ...vaccinationChecks, { ...failedLater, overridden: true }])).to.deep.equal([]);
  });

  // Our own rule: the sprayer battery is checked only when a sprayer is used.
  it('asks for the sprayer battery only for a spray vaccination', () => {
    const member: RecordedCheck[] = (['twelve_hour', 'hygiene', 'ppe'] as const).map((kind, i) => ({ id: 10 + i, kind, memberId: 1, passed: true, overridden: false }));
    const withoutBattery: RecordedCheck[] = (['flock_health', 'withdrawal', 'water_treatments', 'heat', 'enough_vaccine'] as const).map((kind, i) => ({
      id: 100 + i, kind, memberId: null, passed: true, overridden: false,
    }));
    expect(startBlockers([1], [...member, ...withoutBattery], 'drinking_water')).to.deep.equal([]);
    expect(startBlockers([1], [...member, ...withoutBattery], 'spray')).to.deep.equal([{ kind: 'battery', memberId: null, why: 'missing' }]);
  });
});

describe('flock history CSV', () => {
  it('quotes commas, quotes and line breaks, and defuses formulas', () => {
    expect(csvField('a, "b"')).to.equal('"a, ""b"""');
    expect(csvField('=SUM(A1)')).to.equal("'=SUM(A1)");
    expect(csvField(-3)).to.equal('-3');
    const csv = historyCsv([{
      date: '2026-12-03', product: 'Spray vaccine', route: 'spray', ageDays: 100, birdsVaccinated: 9450,
      lots: [{ lotNumber: 'A1', vialsUsed: 6, dosesUsed: 6000, vialsReturned: 1 }, { lotNumber: 'B2', vialsUsed: 4, dosesUsed: 4000, vialsReturned: 0 }],
      startedAt: 's', endedAt: 'e', crewLead: 'Lee', crew: ['Kim', 'Ash'], deviations: 'line 1\nline 2', signedAt: 't',
    }]);
    // Hand-computed sums over the two lots: 10 vials, 10,000 doses, 1 returned.
    expect(csv.split('\r\n')[1]).to.equal('2026-12-03,Spray vaccine,spray,100,9450,A1; B2,10,10000,1,s,e,Lee,Kim; Ash,"line 1\nline 2",t');
  });
});
