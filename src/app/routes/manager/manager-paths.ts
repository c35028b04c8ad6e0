// Where the manager's screens live, so features link to each other's pages without importing each other.
export const managerPaths = {
  queue: '/review',
  record: (id: number) => `/review/${id}`,
  allVisits: '/visits/all',
  dashboard: '/dashboard',
  pressHistory: (pressId: number) => `/presses/${pressId}/history`,
};
