import { z } from 'zod';
import { ACCURACY_PERCENT, parseDecimal } from '@gaugeproof/api-types';
import { api } from '@/lib/api-client';
import {
  INSTRUMENT_KINDS,
  RESOLUTION_UNITS,
  UNITS_BY_KIND,
  type Instrument,
} from '@/features/instruments/types';
import { queryKeys } from '@/lib/query-keys';
import { useWriteMutation } from '@/lib/write-mutation';
import { maxChars } from '@/lib/contract-rules';

const DATE = /^\d{4}-\d{2}-\d{2}$/;
const realDate = (v: string) => DATE.test(v) && !Number.isNaN(Date.parse(`${v}T00:00:00Z`));

/** An optional amount typed as text: empty, or a number from 0 (to `max`). */
/** An optional amount typed as text: empty, or a number from 0 (to `max`), read as the contract's parseDecimal. */
const optionalAmount = (message: string, max = Infinity) =>
  z.string().refine((v) => {
    if (v.trim() === '') return true;
    const n = parseDecimal(v);
    return n !== null && n >= 0 && n <= max;
  }, message);

const amountOrNull = (v: string): number | null => (v.trim() === '' ? null : parseDecimal(v));

export const instrumentSchema = z
  .object({
    kind: z.enum(INSTRUMENT_KINDS, 'Choose the kind of instrument.'),
    name: z
      .string()
      .trim()
      .min(1, 'Enter a name, e.g. “Bench balance B-2”.')
      .max(...maxChars('name')),
    serial: z
      .string()
      .trim()
      .min(1, 'Enter the serial number.')
      .max(...maxChars('reference')),
    resolution: z.string().refine((v) => {
      const n = parseDecimal(v);
      return n !== null && n > 0;
    }, 'The smallest step it shows, a number greater than 0.'),
    resolutionUnit: z.enum(RESOLUTION_UNITS, 'Choose the unit.'),
    accuracyPercentOfReading: optionalAmount(
      `A percentage from ${ACCURACY_PERCENT.min} to ${ACCURACY_PERCENT.max}, e.g. 0.2.`,
      ACCURACY_PERCENT.max,
    ),
    accuracyAbsolute: optionalAmount('An amount of 0 or more, in the unit above.'),
    calibrationUncertainty: optionalAmount('The certificate’s U (k = 2), 0 or more.'),
    calibratedOn: z.string().refine(realDate, 'Enter the calibration date.'),
    calibrationDueOn: z.string().refine(realDate, 'Enter the date the next calibration is due.'),
  })
  .superRefine((v, ctx) => {
    if (!(UNITS_BY_KIND[v.kind] as readonly string[]).includes(v.resolutionUnit)) {
      ctx.addIssue({
        code: 'custom',
        path: ['resolutionUnit'],
        message: `This kind reads in ${UNITS_BY_KIND[v.kind].join(' or ')}.`,
      });
    }
    if (realDate(v.calibratedOn) && realDate(v.calibrationDueOn)) {
      if (v.calibrationDueOn <= v.calibratedOn) {
        ctx.addIssue({
          code: 'custom',
          path: ['calibrationDueOn'],
          message: 'The due date must come after the calibration date.',
        });
      }
    }
  });
export type InstrumentInput = z.infer<typeof instrumentSchema>;

export type InstrumentBody = Omit<
  InstrumentInput,
  'resolution' | 'accuracyPercentOfReading' | 'accuracyAbsolute' | 'calibrationUncertainty'
> & {
  resolution: number;
  accuracyPercentOfReading: number | null;
  accuracyAbsolute: number | null;
  calibrationUncertainty: number | null;
};

export const toInstrumentBody = (input: InstrumentInput): InstrumentBody => ({
  ...input,
  name: input.name.trim(),
  serial: input.serial.trim(),
  resolution: parseDecimal(input.resolution) ?? Number.NaN,
  accuracyPercentOfReading: amountOrNull(input.accuracyPercentOfReading),
  accuracyAbsolute: amountOrNull(input.accuracyAbsolute),
  calibrationUncertainty: amountOrNull(input.calibrationUncertainty),
});

export const createInstrument = (body: InstrumentBody) =>
  api.post<Instrument>('/instruments', body);

export function useCreateInstrument() {
  return useWriteMutation(createInstrument, {
    refresh: [queryKeys.instruments.all],
  });
}
