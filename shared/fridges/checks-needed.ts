// How many recorded checks a fridge needs on a day: once with a min/max display, twice without (CDC guidance).

export function checksNeededPerDay(minMaxDisplay: boolean): number {
  return minMaxDisplay ? 1 : 2;
}
