import { expect } from 'chai';
import {
  celsiusToFahrenheit,
  celsiusToKelvin,
  fahrenheitToCelsius,
  fahrenheitToKelvin,
  fromCelsius,
  kelvinToCelsius,
  toCelsius,
} from '../../../shared/temperature/convert-temperature.js';

// Expected values from NIST SP 811, §4.2.1.1 (t/°C = T/K − 273.15) and appendix B.9
// (t/°C = (t/°F − 32)/1.8, T/K = (t/°F + 459.67)/1.8), rounded to 3 decimals.
describe('convert-temperature', () => {
  it('converts the 35–45 °F limits and their neighbours to °C as NIST SP 811 gives', () => {
    expect(fahrenheitToCelsius(35)).to.be.closeTo(1.667, 0.0005); // NIST SP 811 B.9
    expect(fahrenheitToCelsius(36)).to.be.closeTo(2.222, 0.0005); // NIST SP 811 B.9
    expect(fahrenheitToCelsius(45)).to.be.closeTo(7.222, 0.0005); // NIST SP 811 B.9
    expect(fahrenheitToCelsius(46)).to.be.closeTo(7.778, 0.0005); // NIST SP 811 B.9
  });

  it('converts 2, 8 and 0 °C to °F as NIST SP 811 gives', () => {
    expect(celsiusToFahrenheit(2)).to.be.closeTo(35.6, 1e-9); // NIST SP 811 B.9
    expect(celsiusToFahrenheit(8)).to.be.closeTo(46.4, 1e-9); // NIST SP 811 B.9
    expect(celsiusToFahrenheit(0)).to.equal(32); // NIST SP 811 B.9
  });

  it('puts −459.67 °F at exactly 0 K', () => {
    expect(fahrenheitToKelvin(-459.67)).to.equal(0); // NIST SP 811 B.9
  });

  it('offsets kelvin from °C by 273.15 both ways', () => {
    expect(celsiusToKelvin(0)).to.equal(273.15); // NIST SP 811 §4.2.1.1
    expect(kelvinToCelsius(273.15)).to.equal(0); // NIST SP 811 §4.2.1.1
  });

  it('round-trips °F through °C', () => {
    for (const f of [-40, 0, 35, 45, 98.6]) expect(celsiusToFahrenheit(fahrenheitToCelsius(f))).to.be.closeTo(f, 1e-9);
  });

  it('treats −40 as the same temperature on both scales', () => {
    expect(fahrenheitToCelsius(-40)).to.be.closeTo(-40, 1e-12); // follows from NIST SP 811 B.9
  });

  it('converts by unit, leaving °C values untouched', () => {
    expect(toCelsius(41, 'F')).to.be.closeTo(5, 1e-12); // hand-computed: (41 − 32)/1.8
    expect(toCelsius(5, 'C')).to.equal(5);
    expect(fromCelsius(5, 'F')).to.be.closeTo(41, 1e-12);
    expect(fromCelsius(5, 'C')).to.equal(5);
  });
});
