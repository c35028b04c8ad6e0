import type { CapacityUnit } from '../format/capacity';
import { z } from 'zod';
import { directorySchemas, type StoredRecord } from './common';
import { idNumber } from './numbers';
import { nameText, text } from './text';

export const siteInputSchema = z.object({
  customerId: idNumber('Pick the customer this site belongs to'),
  name: nameText({ min: 2, minMessage: 'Enter the site name (2 characters or more)', max: 120 }),
  address: text({ max: 300 }).optional(),
  city: nameText({ max: 120 }).optional(),
});
export type SiteInput = z.infer<typeof siteInputSchema>;
export const { update: siteUpdateSchema, listQuery: siteListQuerySchema } = directorySchemas(siteInputSchema, { customerId: idNumber().optional() });
export type SiteUpdate = z.infer<typeof siteUpdateSchema>;
export type SiteListQuery = z.infer<typeof siteListQuerySchema>;

export interface Site extends StoredRecord {
  customerId: number;
  customerName?: string;
  /** The customer's unit for press capacity. */
  capacityUnit: CapacityUnit;
  name: string;
  address: string | null;
  city: string | null;
}
