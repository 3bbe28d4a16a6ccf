// Minutes as people read them: "45 min", "3 h 20 min", "2 d 4 h".

export function durationText(minutes: number | null): string {
  if (minutes === null) return 'unknown';
  const whole = Math.round(minutes);
  if (whole < 60) return `${whole} min`;
  const hours = Math.floor(whole / 60);
  if (hours < 48) return `${hours} h ${whole % 60} min`;
  return `${Math.floor(hours / 24)} d ${hours % 24} h`;
}
