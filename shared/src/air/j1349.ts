/**
 * SAE J1349 power correction factor for spark-ignition engines.
 *
 * Edition implemented: the correction equation of SAE J1349 "Engine Power Test Code - Spark Ignition
 * and Compression Ignition - Net Power Rating", revision JUN1990, which later revisions (AUG2004)
 * carry for naturally aspirated spark-ignition engines, to our knowledge:
 *
 *   CF = 1.18 * (99 / Pd) * sqrt((t + 273) / 298) - 0.18
 *
 * Pd = dry-air (total minus water-vapour) pressure in kPa, t = inlet air temperature in C.
 * Reference conditions: 25 C and 99 kPa dry-air pressure (100 kPa total), where CF = 1.
 * Corrected power = CF * observed power. The 1.18 / 0.18 split assumes friction is a fixed share
 * of indicated power.
 *
 * Limits the standard puts on the test conditions (from memory; the standard's text was not at
 * hand): inlet air 15..35 C, dry-air pressure 90..105 kPa. Outside them `j1349Warnings` says so.
 * The factor is a dynamometer correction for a comparison of power figures, not a jetting rule.
 */

export const J1349_REFERENCE = { temperatureC: 25, dryAirPressureKPa: 99 } as const;
export const J1349_LIMITS = { minTemperatureC: 15, maxTemperatureC: 35, minDryAirPressureKPa: 90, maxDryAirPressureKPa: 105 } as const;

/** SAE J1349 correction factor from dry-air pressure (kPa) and inlet air temperature (C). */
export function j1349CorrectionFactor(dryAirPressureKPa: number, temperatureC: number): number {
  return 1.18 * (J1349_REFERENCE.dryAirPressureKPa / dryAirPressureKPa) * Math.sqrt((temperatureC + 273) / 298) - 0.18;
}

/** Plain warnings when the conditions are outside the limits the standard sets for the correction. */
export function j1349Warnings(dryAirPressureKPa: number, temperatureC: number): string[] {
  const out: string[] = [];
  const L = J1349_LIMITS;
  if (temperatureC < L.minTemperatureC || temperatureC > L.maxTemperatureC) {
    out.push(
      `Power correction factor: the air temperature ${temperatureC.toFixed(1)} C is outside the ${L.minTemperatureC}..${L.maxTemperatureC} C range SAE J1349 allows for the correction; treat the factor as a rough guide.`,
    );
  }
  if (dryAirPressureKPa < L.minDryAirPressureKPa || dryAirPressureKPa > L.maxDryAirPressureKPa) {
    out.push(
      `Power correction factor: the dry-air pressure ${dryAirPressureKPa.toFixed(1)} kPa is outside the ${L.minDryAirPressureKPa}..${L.maxDryAirPressureKPa} kPa range SAE J1349 allows for the correction; treat the factor as a rough guide.`,
    );
  }
  return out;
}
