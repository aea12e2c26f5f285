'use client';
/** Re-renders the page from the server every `seconds` while it is visible. */
import { useRouter } from 'next/navigation';
import { useEffect, useState } from 'react';

export function AutoRefresh({ seconds = 15 }: { seconds?: number }) {
  const router = useRouter();
  const [at, setAt] = useState(() => new Date().toISOString().slice(11, 19));
  useEffect(() => {
    const id = setInterval(() => {
      if (document.visibilityState === 'visible') { router.refresh(); setAt(new Date().toISOString().slice(11, 19)); }
    }, seconds * 1000);
    return () => clearInterval(id);
  }, [router, seconds]);
  return <p className="text-caption text-ink-muted" aria-live="polite" data-testid="auto-refresh">Refreshes by itself every {seconds} s · last {at} UTC</p>;
}
