/** Arcline's own plan colours: slate ink on warm paper, signal amber, deep teal; status also by pattern/text. */
export const PAL = {
  paper: '#F7F4EE',
  grid: '#E2DBCD',
  gridMajor: '#CFC6B4',
  ink: '#15202B',
  inkSoft: '#3A4A5A',
  muted: '#5F6E7C',
  amber: '#F2A900',
  amberDark: '#B57E00',
  teal: '#0F5C63',
  tealLight: '#D5ECEE',
  over: '#B3261E',
  overLight: '#FBE3E1',
  within: '#1F6F3A',
  truckFill: '#C9D3DC',
  cabFill: '#A9B7C4',
  padFill: '#15202B',
  cribFill: '#B08A5A',
  loadFill: '#F2A900',
  trailerFill: '#E9E2D3',
  obstacle: { structure: '#8C7B6B', vehicle: '#7D8C99', pole: '#5B4A3A', tree: '#5E7F4E', 'traffic-lane': '#D9CFA8', 'power-line': '#B3261E' } as Record<string, string>,
  select: '#0F5C63',
} as const;

/** Dash patterns: a failed check is drawn dashed and labelled, never told by colour alone. */
export const DASH_OVER = [10, 6];
export const DASH_PLAN = [6, 5];
