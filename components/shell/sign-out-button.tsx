'use client';

import { signOut } from 'next-auth/react';

export function SignOutButton() {
  return (
    <button type="button" className="btn-secondary px-2.5 py-1.5" onClick={() => void signOut({ callbackUrl: '/sign-in' })}>
      Sign out
    </button>
  );
}
