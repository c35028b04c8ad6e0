import { randomBytes } from 'node:crypto';
import { hashPassword } from '../server/auth/password';
import { Customer } from '../server/modules/customers/customers.model';
import { Press } from '../server/modules/presses/presses.model';
import { Site } from '../server/modules/sites/sites.model';
import { User } from '../server/modules/users/users.model';
import type { Role } from '../shared/schemas/roles';

export const TEST_PASSWORD = 'correct horse battery staple';
let passwordHash: Promise<string> | undefined;
const unique = () => randomBytes(4).toString('hex');

export async function makeUser(role: Role, overrides: Partial<{ email: string; name: string; active: boolean }> = {}) {
  passwordHash ??= hashPassword(TEST_PASSWORD);
  return User.create({
    email: overrides.email ?? `${role}-${unique()}@test.example`,
    name: overrides.name ?? `Test ${role}`,
    role,
    active: overrides.active ?? true,
    passwordHash: await passwordHash,
  });
}

export async function makePress(overrides: Partial<{ assetTag: string; model: string; customerName: string; siteName: string }> = {}) {
  const customer = await Customer.create({ name: overrides.customerName ?? `Test Customer ${unique()}`, contactName: null, contactEmail: null, contactPhone: null, notes: null });
  const site = await Site.create({ customerId: customer.id, name: overrides.siteName ?? `Test Site ${unique()}`, address: null, city: null });
  const press = await Press.create({
    siteId: site.id,
    assetTag: overrides.assetTag ?? `T-${unique()}`,
    model: overrides.model ?? 'Test model',
    tonnage: 200,
    controlModel: null,
    sensorGeneration: null,
    controlFirmware: '3.4',
    monitorFirmware: '2.9',
    notes: null,
  });
  return { customer, site, press };
}
