// Mean kinetic temperature (USP ⟨1160⟩): the one temperature that stresses a product as the series does.
import { celsiusToKelvin, kelvinToCelsius } from '../temperature/convert-temperature.js';

/** USP ⟨1160⟩: ΔH = 83.144 kJ/mol and R = 8.3144 J/(mol·K), so ΔH/R = 10,000 K. */
export const MKT_ACTIVATION_ENERGY_J_PER_MOL = 83_144;
export const GAS_CONSTANT_J_PER_MOL_K = 8.3144;
export const MKT_ACTIVATION_OVER_R_K = 10_000;

/**
 * T_mk = (ΔH/R) / −ln(Σ wᵢ·exp(−ΔH/(R·Tᵢ)) / Σ wᵢ), with Tᵢ in kelvin; equal weights when none are given.
 * NaN when there is nothing to weigh.
 */
export function meanKineticTemperatureC(tempsC: ArrayLike<number>, weights?: ArrayLike<number>): number {
  if (weights !== undefined && weights.length !== tempsC.length) {
    throw new RangeError('temperatures and weights differ in length');
  }
  // The exponents are around −35; factoring out the largest keeps the sum well away from underflow.
  let largest = -Infinity;
  for (let i = 0; i < tempsC.length; i++) {
    largest = Math.max(largest, -MKT_ACTIVATION_OVER_R_K / celsiusToKelvin(tempsC[i]));
  }
  let sum = 0;
  let total = 0;
  for (let i = 0; i < tempsC.length; i++) {
    const w = weights === undefined ? 1 : weights[i];
    sum += w * Math.exp(-MKT_ACTIVATION_OVER_R_K / celsiusToKelvin(tempsC[i]) - largest);
    total += w;
  }
  if (!(total > 0)) return NaN;
  return kelvinToCelsius(MKT_ACTIVATION_OVER_R_K / -(largest + Math.log(sum / total)));
}
