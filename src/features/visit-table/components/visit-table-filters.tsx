import { VISIT_STATUS_LABELS } from '@shared/format/labels';
import { useQuery } from '@tanstack/react-query';
import { useId } from 'react';
import { CAUSE_LABELS, VISIT_STATUSES } from '@shared/schemas/visit';
import { ChoiceChips } from '@/components/ui/choice-chips';
import { SearchBox } from '@/components/ui/search-box';
import { TextInput } from '@/components/ui/text-input';
import { customerListOptions } from '@/api/customers';
import { pressListOptions } from '@/api/presses';
import { siteListOptions } from '@/api/sites';
import { technicianOptions, type VisitTableRequest } from '@/api/visit-table';
import type { VisitTableParam } from '../hooks/use-visit-table-params';
import { FilterSelect } from './filter-select';

const STATUS_OPTIONS = VISIT_STATUSES.map((status) => ({ value: status, label: VISIT_STATUS_LABELS[status] }));

// Every choice in one request; the choices change seldom, and the list must not show the previous
// customer's sites while the next customer's load.
const CHOICES = { pageSize: 100 } as const;
const choiceOptions = { staleTime: 5 * 60_000, placeholderData: undefined } as const;

interface VisitTableFiltersProps {
  request: VisitTableRequest;
  onChange: (key: VisitTableParam, value: string) => void;
}

export function VisitTableFilters({ request, onChange }: VisitTableFiltersProps) {
  const id = useId();
  const customerId = request.customerId ?? '';
  const siteId = request.siteId ?? '';
  const customers = useQuery({ ...customerListOptions(CHOICES), ...choiceOptions });
  const sites = useQuery({ ...siteListOptions({ ...CHOICES, customerId: Number(customerId) }), ...choiceOptions, enabled: customerId !== '' });
  const presses = useQuery({ ...pressListOptions({ ...CHOICES, siteId: Number(siteId) }), ...choiceOptions, enabled: siteId !== '' });
  const technicians = useQuery(technicianOptions());
  const statuses = (request.status ?? '').split(',').filter(Boolean);

  const toggleStatus = (status: string, on: boolean) => {
    const next = on ? [...statuses, status] : statuses.filter((s) => s !== status);
    onChange('status', VISIT_STATUSES.filter((s) => next.includes(s)).join(','));
  };

  return (
    <div className="space-y-5 rounded-xl border border-surface-line bg-surface-raised p-5">
      <SearchBox label="Search visits" hint="Visit number, fault text, actions, press, customer, site or technician" value={request.q ?? ''} onSearch={(text) => onChange('q', text)} />
      <ChoiceChips legend="Status" options={STATUS_OPTIONS} selected={statuses} onToggle={toggleStatus} />
      <div className="grid gap-4 md:grid-cols-3">
        <FilterSelect label="Customer" anyLabel="All customers" value={customerId} onChange={(v) => onChange('customerId', v)} options={(customers.data?.items ?? []).map((c) => ({ value: String(c.id), label: c.name }))} />
        <FilterSelect
          label="Site"
          anyLabel="All sites"
          value={siteId}
          disabled={!customerId}
          hint={customerId ? undefined : 'Choose a customer first'}
          onChange={(v) => onChange('siteId', v)}
          options={(sites.data?.items ?? []).map((s) => ({ value: String(s.id), label: s.name }))}
        />
        <FilterSelect
          label="Press"
          anyLabel="All presses"
          value={request.pressId ?? ''}
          disabled={!siteId && !request.pressId}
          hint={siteId || request.pressId ? undefined : 'Choose a site first'}
          onChange={(v) => onChange('pressId', v)}
          options={(presses.data?.items ?? []).map((p) => ({ value: String(p.id), label: `${p.assetTag} · ${p.model}` }))}
        />
        <FilterSelect
          label="Technician"
          anyLabel="All technicians"
          value={request.technicianId ?? ''}
          onChange={(v) => onChange('technicianId', v)}
          options={(technicians.data?.items ?? []).map((t) => ({ value: String(t.id), label: t.active ? t.name : `${t.name} (inactive)` }))}
        />
        <FilterSelect label="Cause" anyLabel="All causes" value={request.cause ?? ''} onChange={(v) => onChange('cause', v)} options={Object.entries(CAUSE_LABELS).map(([value, label]) => ({ value, label }))} />
        <div className="grid grid-cols-2 gap-3">
          <div className="space-y-1.5">
            <label htmlFor={`${id}-from`} className="block text-lg font-semibold text-ink">
              Started from
            </label>
            <TextInput id={`${id}-from`} type="date" value={request.from ?? ''} onChange={(e) => onChange('from', e.target.value)} />
          </div>
          <div className="space-y-1.5">
            <label htmlFor={`${id}-to`} className="block text-lg font-semibold text-ink">
              to
            </label>
            <TextInput id={`${id}-to`} type="date" value={request.to ?? ''} min={request.from} onChange={(e) => onChange('to', e.target.value)} />
          </div>
        </div>
      </div>
    </div>
  );
}
