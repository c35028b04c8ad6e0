import type { Page } from '../../../shared/schemas/common';
import type { Site as SiteDto, SiteInput, SiteListQuery, SiteUpdate } from '../../../shared/schemas/site';
import { withConstraintMessages } from '../../lib/db-errors';
import { notFound } from '../../lib/errors';
import { toPage } from '../../lib/paging';
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
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

const MESSAGES = {
  unique: 'This customer already has a site with that name.',
  foreignKey: 'That customer does not exist. Pick a customer from the list.',
};

export async function searchSites(q: SiteListQuery): Promise<Page<SiteDto>> {
  const { rows, count } = await listSites(q);
  return toPage(rows.map(toSiteDto), count, q);
}

export async function getSite(id: number): Promise<SiteDto> {
  const site = await findSite(id);
  if (!site) throw notFound(`Site ${id}`);
  return toSiteDto(site);
}

export async function createSite(input: SiteInput): Promise<SiteDto> {
  const created = await withConstraintMessages(() => insertSite(input), MESSAGES);
  return getSite(created.id);
}

export async function updateSite(id: number, input: SiteUpdate): Promise<SiteDto> {
  const site = await findSite(id);
  if (!site) throw notFound(`Site ${id}`);
  await withConstraintMessages(() => saveSite(site, input), MESSAGES);
  return getSite(id);
}
