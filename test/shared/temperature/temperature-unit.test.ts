import { expect } from 'chai';
import { parseTemperatureUnit } from '../../../shared/temperature/temperature-unit.js';

describe('parseTemperatureUnit', () => {
  it('reads the usual ways of writing each unit, in any case', () => {
    for (const text of ['F', 'f', '°F', 'degF', 'Fahrenheit', ' ℉ ']) expect(parseTemperatureUnit(text), text).to.equal('F');
    for (const text of ['C', 'c', '°C', 'deg C', 'celsius', '℃']) expect(parseTemperatureUnit(text), text).to.equal('C');
  });

  it('returns undefined for anything else, kelvin included', () => {
    for (const text of ['', 'K', 'kelvin', 'FC', 'temp']) expect(parseTemperatureUnit(text), text).to.equal(undefined);
  });
});
