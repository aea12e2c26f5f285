'use client';

import { useState } from 'react';
import { MenuIcon } from '@/components/ui/icons';
import { NavLinks, type NavLinkItem } from './nav-links';

/** The section list behind a menu button at phone width. */
export function MobileNav({ items }: { items: NavLinkItem[] }) {
  const [open, setOpen] = useState(false);
  return (
    <div className="md:hidden">
      <button type="button" className="btn-secondary px-2.5" aria-expanded={open} aria-controls="mobile-nav"
        onClick={() => setOpen((v) => !v)}>
        <MenuIcon /> <span className="sr-only sm:not-sr-only">Menu</span>
      </button>
      {open ? (
        <nav id="mobile-nav" aria-label="Sections" className="absolute inset-x-0 top-full z-20 border-b border-line bg-surface p-3 shadow-card">
          <NavLinks items={items} onNavigate={() => setOpen(false)} />
        </nav>
      ) : null}
    </div>
  );
}
