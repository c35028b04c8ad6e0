import type { Page } from '@shared/schemas/common';
import type { Customer } from '@shared/schemas/customer';
import type { Press } from '@shared/schemas/press';
import type { SessionUser } from '@shared/schemas/session';

// Invented test data: no real company, person, press model or part number.
export const technician: SessionUser = { id: 1, email: 'tech@example.test', name: 'Ada Invented', role: 'technician' };
export const manager: SessionUser = { id: 2, email: 'manager@example.test', name: 'Mo Madeup', role: 'manager' };
export const admin: SessionUser = { id: 3, email: 'admin@example.test', name: 'Alex Fictional', role: 'admin' };

export function press(overrides: Partial<Press> = {}): Press {
  return {
    id: 1,
    siteId: 10,
    siteName: 'Plant North (invented)',
    customerId: 100,
    customerName: 'Example Stampings (invented)',
    assetTag: 'PX-101',
    model: 'Invented SP-250',
    tonnage: 250,
    capacityUnit: 'us_ton',
    controlModel: 'Demo CTL-4',
    sensorGeneration: 'Gen A (invented)',
    controlFirmware: '2.10',
    monitorFirmware: '3.1.4',
    notes: null,
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...overrides,
  };
}

export function customer(overrides: Partial<Customer> = {}): Customer {
  return {
    id: 100,
    name: 'Example Stampings (invented)',
    contactName: 'Pat Placeholder',
    contactEmail: 'pat@example.test',
    contactPhone: '555-0100',
    notes: null,
    capacityUnit: 'us_ton',
    createdAt: '2026-01-01T00:00:00.000Z',
    updatedAt: '2026-01-01T00:00:00.000Z',
    ...overrides,
  };
}

export const pageOf = <T>(items: T[], extra: Partial<Page<T>> = {}): Page<T> => ({
  items,
  total: items.length,
  page: 1,
  pageSize: 20,
  ...extra,
});
