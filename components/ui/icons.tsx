import type { ReactNode } from 'react';

/** Small line icons drawn for Arcline (24 px grid, currentColor), so nothing depends on font glyph coverage. */
function Icon({ children, className = 'h-5 w-5' }: { children: ReactNode; className?: string }) {
  return (
    <svg viewBox="0 0 24 24" aria-hidden className={className} fill="none" stroke="currentColor" strokeWidth="2.2" strokeLinecap="round" strokeLinejoin="round">
      {children}
    </svg>
  );
}

export type IconName = 'scenes' | 'equipment' | 'rigging' | 'users' | 'settings' | 'check' | 'cross' | 'pencil' | 'clock' | 'box' | 'alert' | 'review' | 'bell';

const paths: Record<IconName, ReactNode> = {
  // swing arc over a base
  scenes: (
    <>
      <path d="M4 17a8 8 0 0 1 16 0" />
      <path d="M12 17l5-7" />
      <path d="M6 20h12" />
    </>
  ),
  // a truck from the side
  equipment: (
    <>
      <path d="M2 16V8h11v8" />
      <path d="M13 11h4l3 3v2h-7" />
      <circle cx="6" cy="17.5" r="1.8" />
      <circle cx="16.5" cy="17.5" r="1.8" />
    </>
  ),
  // a hook below a shackle
  rigging: (
    <>
      <path d="M9 3h6" />
      <path d="M9 3c0 3 1 4 3 4s3-1 3-4" />
      <path d="M12 7v5" />
      <path d="M12 12a4 4 0 1 1-4 4" />
    </>
  ),
  users: (
    <>
      <circle cx="9" cy="8" r="3.2" />
      <path d="M3 20c0-3.3 2.7-6 6-6s6 2.7 6 6" />
      <path d="M16 5.2a3 3 0 0 1 0 5.6M18 14.5c1.8.9 3 2.9 3 5.5" />
    </>
  ),
  // two sliders
  settings: (
    <>
      <path d="M4 7h16M4 17h16" />
      <circle cx="9" cy="7" r="2.4" fill="currentColor" />
      <circle cx="15" cy="17" r="2.4" fill="currentColor" />
    </>
  ),
  check: <path d="M5 12.5l4.5 4.5L19 7.5" />,
  cross: <path d="M6 6l12 12M18 6L6 18" />,
  pencil: <path d="M4 20l1-4L16 5l3 3L8 19l-4 1z" />,
  clock: (
    <>
      <circle cx="12" cy="12" r="8" />
      <path d="M12 8v4l3 2" />
    </>
  ),
  box: (
    <>
      <rect x="4" y="5" width="16" height="14" rx="1.5" />
      <path d="M4 10h16M10 14h4" />
    </>
  ),
  alert: (
    <>
      <path d="M12 4l9 16H3z" />
      <path d="M12 10v4M12 17v.5" />
    </>
  ),
  // a clipboard with a tick: a plan waiting for a decision
  review: (
    <>
      <rect x="5" y="4.5" width="14" height="16" rx="1.5" />
      <path d="M9.5 3h5v3h-5z" />
      <path d="M8.5 13.5l2.5 2.5 4.5-5" />
    </>
  ),
  bell: (
    <>
      <path d="M6 16V11a6 6 0 0 1 12 0v5l1.5 2h-15z" />
      <path d="M10 20.5h4" />
    </>
  ),
};

export function AppIcon({ name, className }: { name: IconName; className?: string }) {
  return <Icon className={className}>{paths[name]}</Icon>;
}
