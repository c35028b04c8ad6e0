import { siteInputSchema, siteListQuerySchema, siteUpdateSchema } from '../../../shared/schemas/site';
import { resourceRoutes } from '../../lib/resource-routes';
import { createSite, getSite, searchSites, updateSite } from './sites.service';

export const siteRoutes = () =>
  resourceRoutes({
    listQuery: siteListQuerySchema,
    createBody: siteInputSchema,
    updateBody: siteUpdateSchema,
    search: searchSites,
    get: getSite,
    create: createSite,
    update: updateSite,
  });
