import { z } from 'zod';
import type { CapacityUnit } from '../format/capacity';
import { directorySchemas, type StoredRecord } from './common';
import { idNumber, wholeNumber } from './numbers';
import { nameText, text } from './text';

const versionText = z
  .string()
  .trim()
  .regex(/^\d+(\.\d+){0,3}$/, 'Type a dotted version such as 2.10 or 3.1.4')
  .optional()
  .or(z.literal('').transform(() => undefined));

export const pressInputSchema = z.object({
  siteId: idNumber('Pick the site where the press stands'),
  assetTag: nameText({ min: 1, minMessage: 'Enter the asset tag painted or labelled on the press', max: 40, maxMessage: 'Asset tag is 40 characters at most' }),
  model: nameText({ min: 1, minMessage: 'Enter the press model', max: 80 }),
  tonnage: wholeNumber({
    min: 1,
    max: 10_000,
    message: "Capacity is a whole number in the customer's unit (US tons or tonnes)",
    minMessage: 'Capacity must be at least 1',
    maxMessage: 'A capacity above 10,000 is not plausible: check the nameplate',
  }),
  controlModel: nameText({ max: 80 }).optional(),
  sensorGeneration: nameText({ max: 40 }).optional(),
  controlFirmware: versionText,
  monitorFirmware: versionText,
  notes: text({ max: 2000 }).optional(),
});
export type PressInput = z.infer<typeof pressInputSchema>;
export const { update: pressUpdateSchema, listQuery: pressListQuerySchema } = directorySchemas(pressInputSchema, { siteId: idNumber().optional(), customerId: idNumber().optional() });
export type PressUpdate = z.infer<typeof pressUpdateSchema>;
export type PressListQuery = z.infer<typeof pressListQuerySchema>;

export interface Press extends StoredRecord {
  siteId: number;
  siteName?: string;
  customerId?: number;
  customerName?: string;
  assetTag: string;
  model: string;
  /** Rated capacity in the customer's unit (`capacityUnit`); print it with formatCapacity. */
  tonnage: number;
  capacityUnit: CapacityUnit;
  controlModel: string | null;
  sensorGeneration: string | null;
  controlFirmware: string | null;
  monitorFirmware: string | null;
  notes: string | null;
}
