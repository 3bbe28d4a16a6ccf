// Runs one planning computation in its own process so its time and peak memory are its own; prints one JSON line.
import { planVaccinations } from '../shared/planning/plan-vaccinations.js';
import { planningScenario } from './planning-scenario.js';

const flocks = Number(process.argv[2] ?? 2000);
const request = planningScenario(flocks);
const before = process.resourceUsage().maxRSS;
const started = performance.now();
const plan = planVaccinations(request);
const ms = performance.now() - started;
process.stdout.write(`${JSON.stringify({
  flocks,
  vaccinations: request.vaccinations.length,
  lots: request.lots.length,
  ms,
  peakRssKb: process.resourceUsage().maxRSS,
  rssBeforeKb: before,
  shortfalls: plan.vaccinations.filter((v) => v.shortfallDoses > 0).length,
})}\n`);
