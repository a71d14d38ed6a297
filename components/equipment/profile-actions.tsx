'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import { fetchJson } from '@/lib/client/fetch-json';

/** Duplicate and retire, for admins. Retiring keeps the profile for the scenes planned with it. */
export function ProfileActions({ id, retired }: { id: number; retired: boolean }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [confirmRetire, setConfirmRetire] = useState(false);
  const run = async (fn: () => Promise<void>) => {
    setError(null);
    try {
      await fn();
    } catch (e) {
      setError(e instanceof Error ? e.message : 'Something went wrong');
    }
  };
  return (
    <div className="flex flex-wrap items-center gap-2">
      <Button
        variant="secondary"
        onClick={() =>
          run(async () => {
            const p = await fetchJson<{ id: number }>(`/api/equipment/${id}/duplicate`, { method: 'POST', body: '{}' });
            router.push(`/equipment/${p.id}?created=1`);
          })
        }
      >
        Duplicate
      </Button>
      {!retired &&
        (confirmRetire ? (
          <>
            <Button variant="danger" onClick={() => run(async () => (await fetchJson(`/api/equipment/${id}/retire`, { method: 'POST' }), router.refresh()))}>
              Yes, retire it
            </Button>
            <Button variant="quiet" onClick={() => setConfirmRetire(false)}>
              Keep it
            </Button>
          </>
        ) : (
          <Button variant="danger" onClick={() => setConfirmRetire(true)}>
            Retire…
          </Button>
        ))}
      {error && <Notice tone="error">{error}</Notice>}
    </div>
  );
}
