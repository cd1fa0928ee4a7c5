import { z } from 'zod';

/** Field builders shared by the design schemas: each message names the quantity and its unit. */

export const isoDateTime = z.iso.datetime({ offset: true });

const withUnit = (unit: string) => (unit ? ` (${unit})` : '');

export const positiveNumber = (label: string, unit: string) =>
  z.number({ error: `Enter the ${label} as a number${unit ? ` in ${unit}` : ''}.` }).positive({ message: `The ${label} must be greater than zero${withUnit(unit)}.` });

export const nonNegativeNumber = (label: string, unit: string) =>
  z.number({ error: `Enter the ${label} as a number${unit ? ` in ${unit}` : ''}.` }).min(0, { message: `The ${label} cannot be negative${withUnit(unit)}.` });

export const numberIn = (label: string, min: number, max: number) =>
  z
    .number({ error: `Enter the ${label} as a number.` })
    .min(min, { message: `The ${label} must be between ${min} and ${max}.` })
    .max(max, { message: `The ${label} must be between ${min} and ${max}.` });

/** Who did something, as a person reads it. */
export const ActorSchema = z.object({ id: z.uuid(), name: z.string() });
export type Actor = z.infer<typeof ActorSchema>;
