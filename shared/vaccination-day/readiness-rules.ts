// Decides each readiness check from what the crew entered and what Vialyard knows; and what still blocks the start.
import { heatAdvice } from './heat-advice.js';
import { attestations, memberCheckKinds, vaccinationCheckKindsFor, type ReadinessKind } from './readiness-kinds.js';
import { twelveHourRule, type FarmVisit } from './twelve-hour-rule.js';

export interface CheckOutcome {
  passed: boolean;
  message: string;
}

export interface CheckFacts {
  /** Planned start of the day's first visit (epoch ms), for the 12-hour rule. */
  firstVisitAt?: number;
  sheetSiteIds?: readonly number[];
  /** From withdrawalStatus: flagged and no override applies. */
  withdrawalBlocks?: boolean;
  withdrawalDays?: number;
  daysBeforeDepletion?: number | null;
  /** The site's heat limit in °F, or null when none is set. */
  heatLimitF?: number | null;
  /** Doses the plan could not cover from lots in the site's fridges. */
  shortfallDoses?: number;
}

export interface CheckAnswers {
  [key: string]: unknown;
  visits?: FarmVisit[];
  expectedTemperature?: { value: number; unit: 'F' | 'C' };
}

function attested(kind: ReadinessKind, answers: CheckAnswers): CheckOutcome {
  const statements = attestations[kind] ?? {};
  const missing = Object.entries(statements).filter(([key]) => answers[key] !== true).map(([, label]) => label);
  return missing.length ? { passed: false, message: `Not confirmed: ${missing.join(', ')}.` } : { passed: true, message: 'Confirmed.' };
}

export function evaluateCheck(kind: ReadinessKind, answers: CheckAnswers, facts: CheckFacts): CheckOutcome {
  switch (kind) {
    case 'twelve_hour': {
      const result = twelveHourRule(facts.firstVisitAt ?? Date.now(), facts.sheetSiteIds ?? [], answers.visits ?? []);
      if (result.ok) return { passed: true, message: 'No other farm in the 12 hours before the first visit.' };
      const names = result.conflicts.map((v) => v.label ?? 'another farm').join(', ');
      return { passed: false, message: `Visited ${names} within 12 hours of the first visit (common practice: stay off other farms for 12 hours).` };
    }
    case 'withdrawal':
      return facts.withdrawalBlocks
        ? { passed: false, message: `Only ${facts.daysBeforeDepletion} days before depletion, inside the ${facts.withdrawalDays}-day withdrawal period.` }
        : { passed: true, message: facts.daysBeforeDepletion == null ? 'No depletion date set.' : `${facts.daysBeforeDepletion} days before depletion; withdrawal is ${facts.withdrawalDays} days.` };
    case 'heat': {
      const expected = answers.expectedTemperature;
      if (!expected) return { passed: false, message: 'Enter the expected temperature.' };
      if (facts.heatLimitF == null) return { passed: true, message: 'No heat limit is set for this site; follow the veterinarian.' };
      const advice = heatAdvice(expected, { value: facts.heatLimitF, unit: 'F' });
      return { passed: !advice.tooHot, message: advice.message };
    }
    case 'enough_vaccine': {
      const base = attested(kind, answers);
      if ((facts.shortfallDoses ?? 0) > 0) return { passed: false, message: `The site's fridges are ${facts.shortfallDoses} doses short for this flock.` };
      return base;
    }
    default:
      return attested(kind, answers);
  }
}

export interface RecordedCheck {
  id: number;
  kind: ReadinessKind;
  memberId: number | null;
  passed: boolean;
  overridden: boolean;
}

export interface Blocker {
  kind: ReadinessKind;
  memberId: number | null;
  why: 'missing' | 'failed';
}

/**
 * What keeps a vaccination from starting: every crew member's own checks and the vaccination's checks must be
 * recorded, and the latest of each passed or overridden by a veterinarian. `checks` are newest last. The route decides
 * which of the vaccination's checks apply (no sprayer battery for drinking water).
 */
export function startBlockers(memberIds: readonly number[], checks: readonly RecordedCheck[], route = 'spray'): Blocker[] {
  const latest = new Map<string, RecordedCheck>();
  for (const check of checks) latest.set(`${check.kind}:${check.memberId ?? ''}`, check);
  const wanted = [
    ...memberIds.flatMap((memberId) => memberCheckKinds.map((kind) => ({ kind, memberId }))),
    ...vaccinationCheckKindsFor(route).map((kind) => ({ kind, memberId: null })),
  ];
  return wanted.flatMap(({ kind, memberId }): Blocker[] => {
    const check = latest.get(`${kind}:${memberId ?? ''}`);
    if (!check) return [{ kind, memberId, why: 'missing' }];
    return check.passed || check.overridden ? [] : [{ kind, memberId, why: 'failed' }];
  });
}
