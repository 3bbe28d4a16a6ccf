// The two temperature scales a log or a limit can be entered in, and reading one from user input.

export type TemperatureUnit = 'F' | 'C';

/** Accepts `F`, `C`, `°F`, `degC`, `Fahrenheit`, `celsius`, ... in any case; undefined when it is neither. */
export function parseTemperatureUnit(text: string): TemperatureUnit | undefined {
  const t = text.trim().toLowerCase().replace(/^(°|º|˚|deg(rees?)?\s*)/, '');
  if (t === 'f' || t === 'fahrenheit' || t === '℉') return 'F';
  if (t === 'c' || t === 'celsius' || t === '℃') return 'C';
  return undefined;
}
