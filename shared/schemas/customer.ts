import { z } from 'zod';
import { CAPACITY_UNITS, type CapacityUnit } from '../format/capacity';
import { directorySchemas, type StoredRecord } from './common';
import { nameText, text } from './text';

const optionalText = (max: number, kind = text) => kind({ max }).optional().transform((v) => (v === '' ? undefined : v));

export const customerInputSchema = z.object({
  name: nameText({ min: 2, minMessage: 'Enter the customer name (2 characters or more)', max: 120 }),
  contactName: optionalText(120, nameText),
  contactEmail: z
    .string()
    .trim()
    .toLowerCase()
    .email('Enter a valid e-mail address, like name@plant.com')
    .max(200)
    .optional()
    .or(z.literal('').transform(() => undefined)),
  contactPhone: optionalText(40, nameText),
  notes: optionalText(2000),
  /** The unit this customer's press capacities are stated in; changing it converts every press of the customer. */
  capacityUnit: z.enum(CAPACITY_UNITS, 'Choose US tons or tonnes').optional(),
});
export type CustomerInput = z.infer<typeof customerInputSchema>;
export const { update: customerUpdateSchema, listQuery: customerListQuerySchema } = directorySchemas(customerInputSchema, {});
export type CustomerUpdate = z.infer<typeof customerUpdateSchema>;

export interface Customer extends StoredRecord {
  name: string;
  contactName: string | null;
  contactEmail: string | null;
  contactPhone: string | null;
  notes: string | null;
  capacityUnit: CapacityUnit;
}
