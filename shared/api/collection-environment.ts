import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';
import { PastDateTime } from './collection-husbandry.js';

export const PROBES = ['warm', 'cool', 'ambient'] as const;

export const CALIBRATION_CAUTION =
  'Probe and logger readings are a guide only: check temperatures with a calibrated thermometer at tub level, on the warm and the cool side, before changing the thermostat.';

export const EnvironmentReading = z.object({
  id: z.number().int(),
  rackId: z.number().int(),
  takenAt: IsoDateTime,
  tempF: z.number().nullable(),
  tempC: z.number().nullable().describe('The same temperature in °C, (°F − 32) / 1.8 (NIST SP 811), to 0.01.'),
  humidityPct: z.number().nullable(),
  probe: z.enum(PROBES).describe('warm side, cool side or room air.'),
  source: z.enum(['manual', 'csv']),
  alerts: z.array(z.string()).describe('Why the reading is outside the range for its probe, if it is.'),
});
export const EnvironmentReadingPage = page(EnvironmentReading).extend({ caution: z.string() });
export const EnvironmentListQuery = listQuery(['takenAt', 'tempF', 'humidityPct']).extend({
  rackId: z.coerce.number().int().positive().optional(),
  alertsOnly: z.enum(['true', 'false']).optional().describe('Only readings outside their range.'),
});

const Reading = z
  .object({
    rackId: z.number().int().positive(),
    takenAt: PastDateTime,
    tempF: z.number().min(-40).max(160).nullable().default(null).describe('°F'),
    humidityPct: z.number().min(0).max(100).nullable().default(null),
    probe: z.enum(PROBES),
  })
  .strict()
  .refine((r) => r.tempF !== null || r.humidityPct !== null, { message: 'give a temperature, a humidity or both', path: ['tempF'] });
export const CreateReadingRequest = Reading.describe('One reading entered by hand.');
export const CREATE_READING_EXAMPLE = { rackId: 1, takenAt: '2026-12-01T08:00:00Z', tempF: 90.5, humidityPct: 55, probe: 'warm' };

export const ReadingUploadResult = z.object({
  rackId: z.number().int(),
  imported: z.number().int(),
  alerts: z.number().int().describe('Imported readings outside their range.'),
  caution: z.string(),
});

export const RangeSet = z
  .object({
    warmF: z.tuple([z.number(), z.number()]),
    coolF: z.tuple([z.number(), z.number()]),
    humidityPct: z.tuple([z.number(), z.number()]),
    caution: z.string(),
  })
  .describe('The ranges alerts are checked against (common practice).');

export const ReadingUploadQuery = z.object({ rackId: z.coerce.number().int().positive().describe('The rack the logger sat in.') }).strict();

export const SpeciesRanges = z
  .object({
    warmF: z.tuple([z.number(), z.number()]).describe('Warm side, °F.'),
    coolF: z.tuple([z.number(), z.number()]).describe('Cool side, °F.'),
    humidityPct: z.tuple([z.number(), z.number()]).describe('Relative humidity, %.'),
  })
  .describe('Husbandry ranges, common practice.');
export const Species = z.object({
  name: z.string().describe('The name animals carry in their species field, e.g. "Python regius".'),
  commonName: z.string().nullable().describe('e.g. "ball python"; null when the shop has none on record.'),
  animalCount: z.number().int().describe('Animals of the species in the collection now (active or on hold).'),
  ranges: SpeciesRanges.nullable().describe('null when the shop has no ranges on record for the species.'),
});
export const SpeciesList = z
  .object({
    items: z.array(Species),
    total: z.number().int(),
    alertRanges: z.string().describe('Which ranges the reading alerts use.'),
    caution: z.string(),
  })
  .describe('The species of the collection, by name, with the husbandry ranges on record.');
