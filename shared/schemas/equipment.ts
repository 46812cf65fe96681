/**
 * Equipment: the brewer's kettle and its losses, as the API and the kettle form share them. SI
 * inside (litres); the form converts at the edge.
 */
import { z } from 'zod';
import { DEFAULT_COOLING_SHRINKAGE } from '../brewmath';
import { num } from './fields';
import { elevationSchema } from './instruments';

/** Common-practice defaults used until a brewer saves their own (common practice, no source). */
export const DEFAULT_EQUIPMENT = {
  name: 'My kettle',
  boilOffLPerHour: 4,
  trubLossL: 1,
  deadSpaceL: 0.5,
  coolingShrinkage: DEFAULT_COOLING_SHRINKAGE,
  elevationM: null,
  kettleCapacityL: null,
} as const;

export const equipmentNameSchema = z
  .string({ error: 'Give the kettle a name.' })
  .trim()
  .min(1, { error: 'Give the kettle a name.' })
  .max(80, { error: 'Use at most 80 characters.' });

const litres = (label: string, max: number) =>
  num({ notNumber: `${label}: enter a number.` }).min(0, { error: `${label} cannot be below 0 L.` }).max(max, { error: `${label} above ${max} L is beyond a home brewery.` });

export const boilOffMeasurementSchema = z
  .object({
    startL: num({ notNumber: 'Starting volume: enter a number.' }).positive({ error: 'The starting volume must be more than 0 L.' }).max(1000, { error: 'Use at most 1000 L.' }),
    endL: num({ notNumber: 'Ending volume: enter a number.' }).positive({ error: 'The ending volume must be more than 0 L.' }).max(1000, { error: 'Use at most 1000 L.' }),
    minutes: num({ notNumber: 'Boil time: enter a number.' }).positive({ error: 'The boil time must be more than 0 minutes.' }).max(600, { error: 'Use at most 600 minutes.' }),
  })
  .superRefine((v, ctx) => {
    if (typeof v.startL === 'number' && typeof v.endL === 'number' && v.endL > v.startL) {
      ctx.addIssue({ code: 'custom', path: ['endL'], message: 'The ending volume is above the starting one; a boil only loses volume. Measure both hot, in the kettle.' });
    }
  });
export type BoilOffMeasurementInput = z.input<typeof boilOffMeasurementSchema>;

export const equipmentProfileInputSchema = z.object({
  name: equipmentNameSchema,
  boilOffLPerHour: num({ notNumber: 'Boil-off rate: enter a number.' }).min(0, { error: 'The boil-off rate cannot be below 0 L/h.' }).max(30, { error: 'A boil-off above 30 L/h is beyond a home kettle.' }),
  trubLossL: litres('Trub loss', 50),
  deadSpaceL: litres('Dead space', 50),
  coolingShrinkage: num({ notNumber: 'Cooling shrinkage: enter a number.' })
    .min(0, { error: 'Cooling shrinkage is between 0 and 10 %.' })
    .max(0.1, { error: 'Cooling shrinkage is between 0 and 10 % (about 4 % is usual).' }),
  elevationM: elevationSchema.nullish(),
  kettleCapacityL: num({ notNumber: 'Kettle size: enter a number.' }).positive({ error: 'The kettle size must be more than 0 L.' }).max(1000, { error: 'A kettle above 1000 L is beyond a home brewery.' }).nullish(),
  /** When given, the boil-off rate is worked out from it (start and end volume, minutes of boil). */
  boilOffMeasurement: boilOffMeasurementSchema.nullish(),
  isDefault: z.boolean({ error: 'Default is yes or no.' }).optional(),
});
export type EquipmentProfileInput = z.input<typeof equipmentProfileInputSchema>;

export const equipmentProfileUpdateSchema = equipmentProfileInputSchema.partial();
export type EquipmentProfileUpdate = z.input<typeof equipmentProfileUpdateSchema>;

export interface EquipmentProfile {
  /** null when these are the common-practice defaults, not a saved profile. */
  id: number | null;
  name: string;
  boilOffLPerHour: number;
  trubLossL: number;
  deadSpaceL: number;
  /** A fraction: 0.04 is 4 %. */
  coolingShrinkage: number;
  elevationM: number | null;
  kettleCapacityL: number | null;
  isDefault: boolean;
  boilOffMeasurement: { startL: number; endL: number; minutes: number; measuredAt: string } | null;
  source: 'saved' | 'common-practice';
  /** Said plainly when the values are defaults. */
  note: string | null;
  updatedAt: string | null;
}
