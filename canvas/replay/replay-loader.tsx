'use client';
import dynamic from 'next/dynamic';
import type { ReplayRoomProps } from './replay-room';

/** Konva needs the browser: the replay room loads on the client only. */
const ReplayRoom = dynamic(() => import('./replay-room').then((m) => m.ReplayRoom), {
  ssr: false,
  loading: () => (
    <div className="flex h-full items-center justify-center text-ink-soft" role="status">
      Opening the replay…
    </div>
  ),
});

export function ReplayLoader(props: ReplayRoomProps) {
  return <ReplayRoom {...props} />;
}
