import { formatCapacity } from '@shared/format/capacity';
import { Link } from 'react-router-dom';
import { buttonVariants } from '@/components/ui/button';
import type { Press } from '@shared/schemas/press';

const NOT_RECORDED = 'not recorded';

function Detail({ term, value }: { term: string; value: string | null | undefined }) {
  return (
    <div className="min-w-0">
      <dt className="text-base text-ink-muted">{term}</dt>
      <dd className={value ? 'font-medium text-ink' : 'italic text-ink-muted'}>{value || NOT_RECORDED}</dd>
    </div>
  );
}

export function PressCard({ press }: { press: Press }) {
  const place = [press.customerName, press.siteName].filter(Boolean).join(' · ');
  return (
    <article
      aria-labelledby={`press-${press.id}-tag`}
      className="rounded-xl border border-surface-line bg-surface-raised p-5 shadow-sm"
    >
      <header className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h2 id={`press-${press.id}-tag`} className="text-2xl font-bold tracking-tight text-ink">
          {press.assetTag}
        </h2>
        <p className="text-lg text-ink">
          {press.model} · {formatCapacity(press.tonnage, press.capacityUnit)}
        </p>
      </header>
      {place && <p className="mt-1 text-lg text-ink-muted">{place}</p>}
      <dl className="mt-4 grid grid-cols-2 gap-x-6 gap-y-3 text-lg lg:grid-cols-4">
        <Detail term="Control model" value={press.controlModel} />
        <Detail term="Sensor generation" value={press.sensorGeneration} />
        <Detail term="Control firmware" value={press.controlFirmware} />
        <Detail term="Monitor firmware" value={press.monitorFirmware} />
      </dl>
      <div className="mt-4">
        <Link
          to={`/visits/new?pressId=${press.id}`}
          className={buttonVariants({ variant: 'secondary' })}
          aria-label={`Start a visit on ${press.assetTag}`}
        >
          Start visit
        </Link>
      </div>
    </article>
  );
}
