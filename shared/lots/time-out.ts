// Time out of a fridge during a transfer, judged against the product's limit (none known: any time out counts).
export interface TimeOutJudgement {
  minutes: number;
  limitMinutes: number | null;
  over: boolean;
}

export function judgeTimeOut(leftAtMs: number, atMs: number, limitMinutes: number | null): TimeOutJudgement {
  const minutes = Math.max(0, (atMs - leftAtMs) / 60_000);
  const over = limitMinutes === null ? minutes > 0 : minutes > limitMinutes;
  return { minutes, limitMinutes, over };
}

/** The hold's reason in words: the minutes out, rounded up to a whole minute so a short stretch never reads as 0. */
export function timeOutReason(judgement: TimeOutJudgement): string {
  const minutes = Math.ceil(judgement.minutes);
  return judgement.limitMinutes === null
    ? `Out of a fridge ${minutes} min during a transfer; the product has no recorded time-out limit, so the veterinarian decides.`
    : `Out of a fridge ${minutes} min during a transfer, over the product's limit of ${judgement.limitMinutes} min.`;
}
