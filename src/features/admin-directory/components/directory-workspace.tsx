import { formatCapacity } from '@shared/format/capacity';
import { useState, type ReactNode } from 'react';
import type { Customer } from '@shared/schemas/customer';
import type { Press } from '@shared/schemas/press';
import type { Site } from '@shared/schemas/site';
import { Button } from '@/components/ui/button';
import { CustomerForm } from './customer-form';
import { DirectoryList } from './directory-list';
import { PressForm } from './press-form';
import { SiteForm } from './site-form';

type Editing<T> = { record: T | null } | null;

/** List on one side, the form for a new or chosen record on the other. */
function Workspace<T extends { id: number }>({ addLabel, list, form }: { addLabel: string; list: (edit: (r: T) => void) => ReactNode; form: (record: T | null, done: () => void) => ReactNode }) {
  const [editing, setEditing] = useState<Editing<T>>(null);
  const done = () => setEditing(null);
  return (
    <div className="space-y-6">
      {editing ? (
        <div key={editing.record?.id ?? 'new'}>{form(editing.record, done)}</div>
      ) : (
        <Button onClick={() => setEditing({ record: null })}>{addLabel}</Button>
      )}
      {list((record) => setEditing({ record }))}
    </div>
  );
}

export function CustomerDirectory() {
  return (
    <Workspace<Customer>
      addLabel="Add a customer"
      form={(record, done) => <CustomerForm customer={record} onDone={done} />}
      list={(edit) => <DirectoryList<Customer> resource="customers" noun="customers" onEdit={edit} describe={(c) => ({ title: c.name, detail: [c.contactName, c.contactEmail].filter(Boolean).join(' · ') || 'No contact recorded' })} />}
    />
  );
}

export function SiteDirectory() {
  return (
    <Workspace<Site>
      addLabel="Add a site"
      form={(record, done) => <SiteForm site={record} onDone={done} />}
      list={(edit) => <DirectoryList<Site> resource="sites" noun="sites" onEdit={edit} describe={(s) => ({ title: s.name, detail: [s.customerName, s.city].filter(Boolean).join(' · ') })} />}
    />
  );
}

export function PressDirectory() {
  return (
    <Workspace<Press>
      addLabel="Add a press"
      form={(record, done) => <PressForm press={record} onDone={done} />}
      list={(edit) => <DirectoryList<Press> resource="presses" noun="presses" onEdit={edit} describe={(p) => ({ title: `${p.assetTag} — ${p.model}`, detail: [p.customerName, p.siteName, formatCapacity(p.tonnage, p.capacityUnit)].filter(Boolean).join(' · ') })} />}
    />
  );
}
