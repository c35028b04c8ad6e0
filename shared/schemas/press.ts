import { z } from 'zod';
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
    message: 'Tonnage is a whole number of tons',
    minMessage: 'Tonnage must be at least 1',
    maxMessage: 'Tonnage above 10,000 tons is not plausible: check the nameplate',
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
  tonnage: number;
  controlModel: string | null;
  sensorGeneration: string | null;
  controlFirmware: string | null;
  monitorFirmware: string | null;
  notes: string | null;
}
