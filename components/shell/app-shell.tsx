import Link from 'next/link';
import type { ReactNode } from 'react';
import { ROLE_LABELS } from '@/lib/auth/roles';
import type { SessionUser } from '@/lib/server/context';
import { MobileNav } from './mobile-nav';
import { navFor } from './nav-items';
import { NavLinks } from './nav-links';
import { SignOutButton } from './sign-out-button';

function Brand() {
  return (
    <Link href="/" className="flex items-center gap-2 font-semibold text-ink">
      <svg viewBox="0 0 24 24" width={24} height={24} aria-hidden className="text-brand">
        <circle cx="12" cy="15" r="5" fill="none" stroke="currentColor" strokeWidth="2" />
        <path d="M12 2v8" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
        <circle cx="12" cy="15" r="1.6" fill="currentColor" />
      </svg>
      <span className="text-title">Probity</span>
    </Link>
  );
}

export function AppShell({ user, children }: { user: SessionUser; children: ReactNode }) {
  const items = navFor(user).map(({ href, label, icon }) => ({ href, label, icon }));
  const roles = user.roles.map((r) => ROLE_LABELS[r]).join(', ');
  return (
    <div className="min-h-dvh md:grid md:grid-cols-[15rem_minmax(0,1fr)]">
      <aside className="hidden border-r border-line bg-surface md:flex md:flex-col">
        <div className="px-4 py-4"><Brand /></div>
        <p className="px-4 pb-3 text-caption uppercase tracking-wide text-ink-faint">{user.workspaceName}</p>
        <nav aria-label="Sections" className="flex-1 px-2"><NavLinks items={items} /></nav>
      </aside>
      <div className="flex min-w-0 flex-col">
        <header className="relative flex items-center justify-between gap-3 border-b border-line bg-surface px-4 py-2.5 md:px-gutter">
          <div className="flex items-center gap-3 md:hidden"><MobileNav items={items} /><Brand /></div>
          <p className="hidden text-small text-ink-muted md:block">{user.workspaceName}</p>
          <div className="flex items-center gap-3">
            <div className="hidden text-right sm:block">
              <p className="text-small font-medium text-ink" data-testid="user-name">{user.name}</p>
              <p className="text-caption text-ink-muted" data-testid="user-roles">{roles}</p>
            </div>
            <SignOutButton />
          </div>
        </header>
        <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-4 py-6 md:px-gutter">{children}</main>
      </div>
    </div>
  );
}
