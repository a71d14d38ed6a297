/**
 * Invented demo trucks. Every figure is an example for the demo, not any real truck's: a real truck's
 * values come from its manufacturer's documents. The equipment library owns the spec schema.
 */
export const DEMO_TRUCKS: { org: 'harrow-ridge' | 'cobalt-flats'; name: string; unitNumber: string; spec: Record<string, unknown> }[] = [
  { org: 'harrow-ridge', name: '50-ton rotator (example values)', unitNumber: 'HR-7', spec: { example: true } },
  { org: 'harrow-ridge', name: '35-ton rotator (example values)', unitNumber: 'HR-4', spec: { example: true } },
  { org: 'cobalt-flats', name: '40-ton rotator (example values)', unitNumber: 'CF-2', spec: { example: true } },
];
