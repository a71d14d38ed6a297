'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { Button, type ButtonVariant } from '@/components/ui/button';

export function SignOutButton({ variant = 'secondary', className }: { variant?: ButtonVariant; className?: string }) {
  const [busy, setBusy] = useState(false);
  return (
    <Button
      variant={variant}
      className={className}
      disabled={busy}
      onClick={() => {
        setBusy(true);
        void signOut({ callbackUrl: '/sign-in?signedOut=1' });
      }}
    >
      {busy ? 'Signing out…' : 'Sign out'}
    </Button>
  );
}
