import { computeAir, isAirInputError, type AirRequest, type AirResponse } from '@fuelwright/shared';
import { FieldsBadRequest } from '../common/validation.js';

/** What each air field is, in the words of someone standing at the track. */
export const AIR_FIELD_WORDS: Record<string, string> = {
  temperatureC: 'the air temperature in the shade, in °C',
  relativeHumidityPct: 'the relative humidity from a weather report or a hygrometer, 0 to 100 %',
  stationPressureHpa: 'the absolute pressure a barometer reads at the track, in hPa (not the sea-level figure of a weather report)',
  altitudeM: 'the track’s elevation above sea level, in metres, as on a map',
  seaLevelPressureHpa: 'the sea-level pressure (QNH) of a weather report, in hPa',
  'reference.densityKgM3': 'the air density of your baseline day, in kg/m³',
  'reference.kind': 'isa-sea-level (the standard atmosphere at sea level) or baseline (a day of your own)',
  co2MoleFraction: 'the carbon dioxide share of the air (0.0004 outdoors)',
};

/**
 * computeAir, with input that cannot describe real air turned into a 400 naming the field
 * (`prefix` puts it under a nested field, e.g. "today.").
 */
export function computeAirOrBadRequest(request: AirRequest, prefix = ''): AirResponse {
  try {
    return computeAir(request);
  } catch (e) {
    if (!isAirInputError(e)) throw e;
    const words = AIR_FIELD_WORDS[e.field];
    const message = words ? `${e.message.replace(/\.$/, '')}: ${words}` : e.message;
    throw new FieldsBadRequest({ [`${prefix}${e.field}`]: [message] });
  }
}
