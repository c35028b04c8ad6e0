import { render, screen, within } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router-dom';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { buildVisitRecord } from '@shared/record/build-visit-record';
import { recordSource } from '@shared/record/testing/visit-record-source';
import { createAppQueryClient } from '@/app/create-app-query-client';
import { AppProvider } from '@/app/provider';
import { mockApi } from '@/testing/mock-api';
import { VisitRecordPage } from './visit-record-page';

afterEach(() => {
  vi.unstubAllGlobals();
});

// Invented visit (company, plant, people, press, band values), built by the shared record builder.
const RECORD = buildVisitRecord(recordSource({ timeZone: 'UTC' }));

describe("the office's visit record page", () => {
  it('shows the shared record with the office extras: status, time to repair, the signer’s e-mail, e-mails and audit trail', async () => {
    mockApi({
      'GET /api/manager/visits/42/record': { status: 200, body: { record: RECORD, reviewComment: null } },
      'GET /api/manager/visits/42/audit': { status: 200, body: { items: [{ id: 1, action: 'visit_closed', actor: { id: 7, name: 'Dana Okafor (invented)' }, detail: {}, createdAt: '2026-12-02T09:35:00Z' }] } },
      'GET /api/emails': { status: 200, body: { items: [] } },
    });
    const router = createMemoryRouter([{ path: '/review/:id', Component: VisitRecordPage }], { initialEntries: ['/review/42'] });
    render(
      <AppProvider queryClient={createAppQueryClient()}>
        <RouterProvider router={router} />
      </AppProvider>,
    );

    expect(await screen.findByRole('heading', { level: 1, name: 'Visit V-000042' })).toBeInTheDocument();
    expect(await screen.findByRole('button', { name: 'Approve' })).toBeInTheDocument();
    const record = screen.getByRole('article', { name: 'Record of visit V-000042' });
    // The record opens with how the press was left.
    expect(record.firstElementChild).toHaveTextContent(/^Press returned to production$/);
    expect(within(record).getByText('Closed — awaiting review')).toBeInTheDocument();
    expect(within(record).getByText('Time to repair (h:mm)').nextSibling).toHaveTextContent('1:35');
    const readings = within(record).getByRole('table', { name: 'Readings of V-000042 with verdicts and bands' });
    expect(within(readings).getAllByText('Open circuit').length).toBeGreaterThan(0);
    expect(within(record).getByText('Ines Varga (invented) (ines@plant.example)')).toBeInTheDocument();
    expect(within(record).getByText('Confirmed 2 Dec 2026, 08:10 UTC by Marek Lindqvist (invented)')).toBeInTheDocument();
    expect(await screen.findByText(/Closed the visit/)).toBeInTheDocument();
    expect(screen.getByText('No report e-mail has been queued for this visit.')).toBeInTheDocument();
  });
});
