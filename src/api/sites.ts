import type { Site } from '@shared/schemas/site';
import { pagedResource, type PagedFilters } from './resource';

export type SiteListFilters = PagedFilters<{ customerId: number }>;

const sites = pagedResource<Site, SiteListFilters, 'sites'>('sites');

export const siteKeys = sites.keys;
export const siteListOptions = sites.listOptions;
