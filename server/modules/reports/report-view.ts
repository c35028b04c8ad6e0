// The report's shape lives in shared/ so the customer's page reads exactly what the server builds.
export type * from '../../../shared/schemas/report-view';
