import type { Customer } from '@shared/schemas/customer';

export function CustomerCard({ customer }: { customer: Customer }) {
  const contact = [customer.contactName, customer.contactPhone].filter(Boolean).join(' · ');
  return (
    <article aria-labelledby={`customer-${customer.id}-name`} className="rounded-xl border border-surface-line bg-surface-raised p-5 shadow-sm">
      <h2 id={`customer-${customer.id}-name`} className="text-2xl font-bold tracking-tight text-ink">
        {customer.name}
      </h2>
      <p className="mt-1 text-lg text-ink-muted">
        {contact || 'No contact recorded'}
        {customer.contactEmail && (
          <>
            {' · '}
            <a className="text-accent underline underline-offset-4" href={`mailto:${customer.contactEmail}`}>
              {customer.contactEmail}
            </a>
          </>
        )}
      </p>
    </article>
  );
}
