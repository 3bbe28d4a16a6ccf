import { expect } from 'chai';
import { classifyTemperatureC, LIMIT_TOLERANCE_C } from '../../../shared/temperature/classify-temperature.js';
import { fahrenheitToCelsius } from '../../../shared/temperature/convert-temperature.js';
import { DEFAULT_STORAGE_RANGE } from '../../../shared/temperature/default-storage-range.js';
import { temperatureInCelsius } from '../../../shared/temperature/temperature.js';
import { rangeInCelsius, type TemperatureRange } from '../../../shared/temperature/temperature-range.js';

// 2–8 °C: the refrigerator range in the CDC Vaccine Storage and Handling Toolkit.
const CDC_REFRIGERATOR: TemperatureRange = { low: 2, high: 8, unit: 'C' };

describe('temperature ranges', () => {
  it('defaults to 35–45 °F, the common practice for refrigerated vaccine storage', () => {
    expect(DEFAULT_STORAGE_RANGE).to.deep.equal({ low: 35, high: 45, unit: 'F' }); // common practice
  });

  it('keeps a range as entered and gives its limits in °C', () => {
    const limits = rangeInCelsius(DEFAULT_STORAGE_RANGE);
    expect(limits.lowC).to.be.closeTo(1.667, 0.0005); // NIST SP 811 B.9
    expect(limits.highC).to.be.closeTo(7.222, 0.0005); // NIST SP 811 B.9
    expect(rangeInCelsius(CDC_REFRIGERATOR)).to.deep.equal({ lowC: 2, highC: 8 }); // CDC Toolkit
  });

  it('keeps a single temperature as entered and compares it through °C', () => {
    const entered = { value: 45, unit: 'F' as const };
    expect(entered.value).to.equal(45);
    expect(temperatureInCelsius(entered)).to.be.closeTo(7.222, 0.0005); // NIST SP 811 B.9
  });

  it('counts a reading exactly on either limit as in range, however the limit was entered', () => {
    const limits = rangeInCelsius(DEFAULT_STORAGE_RANGE);
    expect(classifyTemperatureC(fahrenheitToCelsius(45.0), limits)).to.equal('in'); // hand-computed
    expect(classifyTemperatureC(fahrenheitToCelsius(35.0), limits)).to.equal('in'); // hand-computed
    expect(classifyTemperatureC(limits.highC + 0.0009, limits)).to.equal('in'); // within the 0.001 °C tolerance
    expect(classifyTemperatureC(8, rangeInCelsius(CDC_REFRIGERATOR))).to.equal('in'); // CDC Toolkit upper limit
  });

  it('calls a reading beyond the tolerance high or low', () => {
    const limits = rangeInCelsius(DEFAULT_STORAGE_RANGE);
    expect(classifyTemperatureC(limits.highC + 2 * LIMIT_TOLERANCE_C, limits)).to.equal('high');
    expect(classifyTemperatureC(limits.lowC - 2 * LIMIT_TOLERANCE_C, limits)).to.equal('low');
    expect(classifyTemperatureC(fahrenheitToCelsius(45.1), limits)).to.equal('high'); // hand-computed
    expect(classifyTemperatureC(fahrenheitToCelsius(34.9), limits)).to.equal('low'); // hand-computed
  });

  it('shows the two ranges differ: 8 °C is in the CDC range but high for 35–45 °F', () => {
    expect(classifyTemperatureC(8, rangeInCelsius(CDC_REFRIGERATOR))).to.equal('in'); // CDC Toolkit
    expect(classifyTemperatureC(8, rangeInCelsius(DEFAULT_STORAGE_RANGE))).to.equal('high'); // 8 °C = 46.4 °F, NIST SP 811
    expect(classifyTemperatureC(1.8, rangeInCelsius(DEFAULT_STORAGE_RANGE))).to.equal('in'); // 1.8 °C = 35.24 °F
    expect(classifyTemperatureC(1.8, rangeInCelsius(CDC_REFRIGERATOR))).to.equal('low'); // CDC Toolkit
  });
});
