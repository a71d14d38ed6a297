/** Our own simple line glyphs for the tool rail (24 × 24, stroke = currentColor). */
const P = { fill: 'none', stroke: 'currentColor', strokeWidth: 2, strokeLinecap: 'round', strokeLinejoin: 'round' } as const;

export const ICONS: Record<string, React.ReactNode> = {
  select: <path {...P} d="M5 3l12 9-5 1 3 6-3 1-3-6-4 4z" />,
  hand: <path {...P} d="M7 12V6a1.5 1.5 0 013 0v5m0-6a1.5 1.5 0 013 0v6m0-5a1.5 1.5 0 013 0v6m0-3a1.5 1.5 0 013 0v4a7 7 0 01-7 7h-1a6 6 0 01-5-3l-3-5a1.5 1.5 0 012.5-1.5L7 14" />,
  truck: (
    <g {...P}>
      <rect x="2" y="8" width="13" height="8" />
      <path d="M15 10h4l3 3v3h-7z" />
      <path d="M6 8l8-5" />
    </g>
  ),
  load: (
    <g {...P}>
      <circle cx="12" cy="13" r="7" />
      <circle cx="12" cy="13" r="2.5" />
      <path d="M12 2v4" />
    </g>
  ),
  trailer: (
    <g {...P}>
      <rect x="2" y="9" width="20" height="6" />
      <circle cx="16" cy="18" r="1.5" />
      <circle cx="19" cy="18" r="1.5" />
    </g>
  ),
  obstacle: (
    <g {...P}>
      <path d="M4 20V9l8-5 8 5v11z" />
      <path d="M4 20l16-11M4 9l16 11" />
    </g>
  ),
  power: <path {...P} d="M13 2L5 14h6l-1 8 8-12h-6z" />,
  note: (
    <g {...P}>
      <path d="M4 4h16v12l-4 4H4z" />
      <path d="M8 9h8M8 13h5" />
    </g>
  ),
  tape: (
    <g {...P}>
      <path d="M3 17L17 3l4 4L7 21z" />
      <path d="M7 13l2 2M10 10l2 2M13 7l2 2" />
    </g>
  ),
};

export function Icon({ name }: { name: string }) {
  return (
    <svg viewBox="0 0 24 24" width={22} height={22} aria-hidden="true">
      {ICONS[name]}
    </svg>
  );
}
