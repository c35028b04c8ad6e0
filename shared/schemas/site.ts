import { z } from 'zod';
import { pageQuerySchema } from './common';

export const siteInputSchema = z.object({
  customerId: z.coerce.number().int().positive('Pick the customer this site belongs to'),
  name: z.string().trim().min(2, 'Enter the site name (2 characters or more)').max(120),
  address: z.string().trim().max(300).optional(),
  city: z.string().trim().max(120).optional(),
});
export type SiteInput = z.infer<typeof siteInputSchema>;
export const siteUpdateSchema = siteInputSchema.partial();
export type SiteUpdate = z.infer<typeof siteUpdateSchema>;

export const siteListQuerySchema = pageQuerySchema.extend({
  customerId: z.coerce.number().int().positive().optional(),
});
export type SiteListQuery = z.infer<typeof siteListQuerySchema>;

export interface Site {
  id: number;
  customerId: number;
  customerName?: string;
  name: string;
  address: string | null;
  city: string | null;
  createdAt: string;
  updatedAt: string;
}
