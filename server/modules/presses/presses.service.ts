import type { Press as PressDto, PressInput, PressListQuery, PressUpdate } from '../../../shared/schemas/press';
import { directoryService, isoTimestamps } from '../../lib/directory-service';
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
    ...isoTimestamps(p),
  };
}

const MESSAGES = {
  unique: 'A press with that asset tag already exists at this site. Check the tag on the press.',
  foreignKey: 'That site does not exist. Pick a site from the list.',
};

const presses = directoryService<Press, PressDto, PressListQuery, PressInput, PressUpdate>({
  what: 'Press',
  repository: { list: listPresses, find: findPress, insert: insertPress, save: savePress },
  toDto: toPressDto,
  messages: MESSAGES,
  rereadAfterWrite: true,
});

export const { search: searchPresses, get: getPress, create: createPress, update: updatePress } = presses;
