import { expect } from 'chai';
import {
  GAS_CONSTANT_J_PER_MOL_K,
  meanKineticTemperatureC,
  MKT_ACTIVATION_ENERGY_J_PER_MOL,
  MKT_ACTIVATION_OVER_R_K,
} from '../../../shared/logs/mean-kinetic-temperature.js';

describe('meanKineticTemperatureC', () => {
  it('uses ΔH = 83.144 kJ/mol and R = 8.3144 J/(mol·K), so ΔH/R = 10,000 K', () => {
    expect(MKT_ACTIVATION_ENERGY_J_PER_MOL / GAS_CONSTANT_J_PER_MOL_K).to.be.closeTo(10_000, 1e-9); // USP ⟨1160⟩
    expect(MKT_ACTIVATION_OVER_R_K).to.equal(10_000); // USP ⟨1160⟩
  });

  it('gives a constant series its own value', () => {
    expect(meanKineticTemperatureC([5, 5, 5, 5])).to.be.closeTo(5, 1e-9); // USP ⟨1160⟩: follows from the formula
    expect(meanKineticTemperatureC([25], [3])).to.be.closeTo(25, 1e-9); // USP ⟨1160⟩
  });

  it('puts any varying series above its arithmetic mean', () => {
    for (const series of [[2, 8], [0, 10, 4], [-5, 30], [4.9, 5.1]]) {
      const mean = series.reduce((a, b) => a + b, 0) / series.length;
      expect(meanKineticTemperatureC(series), series.join(',')).to.be.above(mean); // USP ⟨1160⟩: Jensen on exp(−ΔH/RT)
    }
  });

  it('matches the worked example 2, 2, 5, 8, 8, 8, 8 °C → 6.25 °C', () => {
    expect(meanKineticTemperatureC([2, 2, 5, 8, 8, 8, 8])).to.be.closeTo(6.25, 0.005); // README of zelti/mkt, 2 decimals
  });

  it('gives 5.536 °C for 2 and 8 °C', () => {
    expect(meanKineticTemperatureC([2, 8])).to.be.closeTo(5.536, 0.0005); // computed from USP ⟨1160⟩
  });

  it('gives 26.260 °C for 20 and 30 °C', () => {
    expect(meanKineticTemperatureC([20, 30])).to.be.closeTo(26.26, 0.0005); // computed from USP ⟨1160⟩
  });

  it('weights each temperature by its time: 23 h at 5 °C then 1 h at 15 °C → 5.764 °C', () => {
    expect(meanKineticTemperatureC([5, 15], [23, 1])).to.be.closeTo(5.764, 0.0005); // computed from USP ⟨1160⟩
    const hourly = [...Array<number>(23).fill(5), 15];
    expect(meanKineticTemperatureC(hourly)).to.be.closeTo(5.764, 0.0005); // computed from USP ⟨1160⟩
  });

  it('rejects weights that do not match the temperatures, and has nothing to say about no data', () => {
    expect(() => meanKineticTemperatureC([1, 2], [1])).to.throw(RangeError);
    expect(meanKineticTemperatureC([])).to.be.NaN;
    expect(meanKineticTemperatureC([4, 6], [0, 0])).to.be.NaN;
  });
});
