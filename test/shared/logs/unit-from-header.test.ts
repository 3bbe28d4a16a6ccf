import { expect } from 'chai';
import { unitFromHeader } from '../../../shared/logs/unit-from-header.js';

describe('unitFromHeader', () => {
  it('reads each way of writing Fahrenheit in a header', () => {
    for (const header of [
      'Temp °F',
      'Temperature (F)',
      'Temp [F]',
      'degF',
      'Temp deg F',
      'temp_f',
      'TEMP_F',
      'Fahrenheit',
      'Temperature ºF',
      'Temp F',
      '℉',
    ]) {
      expect(unitFromHeader(header), header).to.equal('F');
    }
  });

  it('reads each way of writing Celsius in a header, in the five languages', () => {
    const headers = [
      'Temp °C',
      'Temperature (C)',
      'degC',
      'temp_c',
      'Celsius',
      'Temperatura (ºC)',
      'Température (°C)',
      'Temperatur [°C]',
      'Temperatuur (°C)',
      'Temperatura grados C',
      'Temperatur in Grad C',
    ];
    for (const header of headers) expect(unitFromHeader(header), header).to.equal('C');
  });

  it('says nothing when the header names no unit, or both', () => {
    for (const header of ['Temperature', 'Temp', 'Value', 'Channel 1 (Ch)', 'Temp °F / °C', 'Fecha']) {
      expect(unitFromHeader(header), header).to.equal(undefined);
    }
  });
});
