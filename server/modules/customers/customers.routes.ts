import { customerInputSchema, customerListQuerySchema, customerUpdateSchema } from '../../../shared/schemas/customer';
import { resourceRoutes } from '../../lib/resource-routes';
import { createCustomer, getCustomer, searchCustomers, updateCustomer } from './customers.service';

export const customerRoutes = () =>
  resourceRoutes({
    listQuery: customerListQuerySchema,
    createBody: customerInputSchema,
    updateBody: customerUpdateSchema,
    search: searchCustomers,
    get: getCustomer,
    create: createCustomer,
    update: updateCustomer,
  });
