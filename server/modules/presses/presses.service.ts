import type { Page } from '../../../shared/schemas/common';
import type { Press as PressDto, PressInput, PressListQuery, PressUpdate } from '../../../shared/schemas/press';
import { withConstraintMessages } from '../../lib/db-errors';
import { notFound } from '../../lib/errors';
import { toPage } from '../../lib/paging';
import type { Press } from './presses.model';
import { findPress, insertPress, listPresses, savePress } from './presses.repository';

export function toPressDto(p: Press): PressDto {
  return {
    id: p.id,
    siteId: p.siteId,
    siteName: p.site?.name,
    customerId: p.site?.customer?.id,
    customerName: p.site?.customer?.name,
    assetTag: p.assetTag,
    model: p.model,
    tonnage: p.tonnage,
    capacityUnit: p.site?.customer?.capacityUnit ?? 'us_ton',
    controlModel: p.controlModel,
    sensorGeneration: p.sensorGeneration,
    controlFirmware: p.controlFirmware,
    monitorFirmware: p.monitorFirmware,
    notes: p.notes,
    createdAt: p.createdAt.toISOString(),
    updatedAt: p.updatedAt.toISOString(),
  };
}

const MESSAGES = {
  unique: 'A press with that asset tag already exists at this site. Check the tag on the press.',
  foreignKey: 'That site does not exist. Pick a site from the list.',
};

export async function searchPresses(q: PressListQuery): Promise<Page<PressDto>> {
  const { rows, count } = await listPresses(q);
  return toPage(rows.map(toPressDto), count, q);
}

export async function getPress(id: number): Promise<PressDto> {
  const press = await findPress(id);
  if (!press) throw notFound(`Press ${id}`);
  return toPressDto(press);
}

export async function createPress(input: PressInput): Promise<PressDto> {
  const created = await withConstraintMessages(() => insertPress(input), MESSAGES);
  return getPress(created.id);
}

export async function updatePress(id: number, input: PressUpdate): Promise<PressDto> {
  const press = await findPress(id);
  if (!press) throw notFound(`Press ${id}`);
  await withConstraintMessages(() => savePress(press, input), MESSAGES);
  return getPress(id);
}
