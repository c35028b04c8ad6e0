import { pressInputSchema, pressListQuerySchema, pressUpdateSchema } from '../../../shared/schemas/press';
import { resourceRoutes } from '../../lib/resource-routes';
import { createPress, getPress, searchPresses, updatePress } from './presses.service';

export const pressRoutes = () =>
  resourceRoutes({
    listQuery: pressListQuerySchema,
    createBody: pressInputSchema,
    updateBody: pressUpdateSchema,
    search: searchPresses,
    get: getPress,
    create: createPress,
    update: updatePress,
  });
