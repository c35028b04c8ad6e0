import type { ReactNode } from 'react';
import { useDocumentTitle } from '@/lib/use-document-title';
import { PageHeader } from './page-header';

interface PageShellProps {
  /** The page's heading and the browser tab's title. */
  title: string;
  description?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
}

/** A route page: its title in the tab and as the heading, the description, then the page's content. */
export function PageShell({ title, description, actions, children }: PageShellProps) {
  useDocumentTitle(title);
  return (
    <>
      <PageHeader title={title} description={description} actions={actions} />
      {children}
    </>
  );
}
