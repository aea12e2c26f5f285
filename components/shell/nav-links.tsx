'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { ReactNode } from 'react';

export interface NavLinkItem { href: string; label: string; icon: ReactNode }

export function NavLinks({ items, onNavigate }: { items: NavLinkItem[]; onNavigate?: () => void }) {
  const pathname = usePathname();
  return (
    <ul className="flex flex-col gap-0.5">
      {items.map((item) => {
        const active = pathname === item.href || pathname.startsWith(`${item.href}/`);
        return (
          <li key={item.href}>
            <Link href={item.href} onClick={onNavigate} aria-current={active ? 'page' : undefined}
              className={`flex items-center gap-3 rounded-control px-3 py-2 text-body font-medium transition-colors ${
                active ? 'bg-brand text-white' : 'text-ink hover:bg-sunken'}`}>
              <span className={active ? 'text-white' : 'text-brand'}>{item.icon}</span>
              {item.label}
            </Link>
          </li>
        );
      })}
    </ul>
  );
}
