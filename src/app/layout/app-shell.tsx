import type { ReactNode } from 'react';
import type { SessionUser } from '@shared/schemas/session';
import { MainNav } from './main-nav';
import { TopBar } from './top-bar';

export function AppShell({ user, children }: { user: SessionUser; children: ReactNode }) {
  return (
    <div className="min-h-screen bg-surface">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-4 focus:top-4 focus:z-50 focus:rounded-lg focus:bg-accent focus:px-5 focus:py-3 focus:text-lg focus:font-semibold focus:text-accent-ink focus:outline-none focus:ring-[3px] focus:ring-accent focus:ring-offset-2"
      >
        Skip to main content
      </a>
      <header className="border-b border-surface-line bg-surface-raised">
        <TopBar user={user} />
        <MainNav role={user.role} />
      </header>
      <main id="main" tabIndex={-1} className="mx-auto max-w-5xl px-4 py-6 focus:outline-none sm:px-6">
        {children}
      </main>
    </div>
  );
}
