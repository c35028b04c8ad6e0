import { Banner } from '@/components/ui/banner';

/** What a person sees for an expired, altered or retired link: the server's words, nothing about any visit. */
export function ReportRefusal({ message }: { message: string }) {
  return (
    <div className="space-y-4">
      <h1 className="text-3xl font-bold text-ink">Report not available</h1>
      <Banner tone="error" role="alert" title="This link does not open a report">
        {message}
      </Banner>
    </div>
  );
}
