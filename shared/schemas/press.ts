import { z } from 'zod';
import { pageQuerySchema } from './common';

const versionText = z
  .string()
  .trim()
  .regex(/^\d+(\.\d+){0,3}$/, 'Type a dotted version such as 2.10 or 3.1.4')
  .optional()
  .or(z.literal('').transform(() => undefined));

export const pressInputSchema = z.object({
  siteId: z.coerce.number().int().positive('Pick the site where the press stands'),
  assetTag: z
    .string()
    .trim()
    .min(1, 'Enter the asset tag painted or labelled on the press')
    .max(40, 'Asset tag is 40 characters at most'),
  model: z.string().trim().min(1, 'Enter the press model').max(80),
  tonnage: z.coerce
    .number()
    .int('Tonnage is a whole number of tons')
    .min(1, 'Tonnage must be at least 1')
    .max(10_000, 'Tonnage above 10,000 tons is not plausible: check the nameplate'),
  controlModel: z.string().trim().max(80).optional(),
  sensorGeneration: z.string().trim().max(40).optional(),
  controlFirmware: versionText,
  monitorFirmware: versionText,
  notes: z.string().trim().max(2000).optional(),
});
export type PressInput = z.infer<typeof pressInputSchema>;
export const pressUpdateSchema = pressInputSchema.partial();
export type PressUpdate = z.infer<typeof pressUpdateSchema>;

export const pressListQuerySchema = pageQuerySchema.extend({
  siteId: z.coerce.number().int().positive().optional(),
  customerId: z.coerce.number().int().positive().optional(),
});
export type PressListQuery = z.infer<typeof pressListQuerySchema>;

export interface Press {
  id: number;
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
  createdAt: string;
  updatedAt: string;
}
