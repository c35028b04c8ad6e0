import type { Site as SiteDto, SiteInput, SiteListQuery, SiteUpdate } from '../../../shared/schemas/site';
import { directoryService, isoTimestamps } from '../../lib/directory-service';
import type { Site } from './sites.model';
import { findSite, insertSite, listSites, saveSite } from './sites.repository';

export function toSiteDto(s: Site): SiteDto {
  return {
    id: s.id,
    customerId: s.customerId,
    customerName: s.customer?.name,
    capacityUnit: s.customer?.capacityUnit ?? 'us_ton',
    name: s.name,
    address: s.address,
    city: s.city,
    ...isoTimestamps(s),
  };
}

const MESSAGES = {
  unique: 'This customer already has a site with that name.',
  foreignKey: 'That customer does not exist. Pick a customer from the list.',
};

const sites = directoryService<Site, SiteDto, SiteListQuery, SiteInput, SiteUpdate>({
  what: 'Site',
  repository: { list: listSites, find: findSite, insert: insertSite, save: saveSite },
  toDto: toSiteDto,
  messages: MESSAGES,
  rereadAfterWrite: true,
});

export const { search: searchSites, get: getSite, create: createSite, update: updateSite } = sites;
