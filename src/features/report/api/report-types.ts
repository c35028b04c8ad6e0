// The report as GET /api/report/:token sends it: the one shape shared with the server.
export type * from '@shared/schemas/report-view';
