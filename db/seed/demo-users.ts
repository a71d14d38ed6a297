import type { Role } from '@/lib/domain';

/** Invented demo organisations and people. The README's sign-in table lists these. */
export const DEMO_PASSWORD = 'arcline-demo-2026';

export const DEMO_ORGS = [
  { slug: 'harrow-ridge', name: 'Harrow Ridge Recovery' },
  { slug: 'cobalt-flats', name: 'Cobalt Flats Towing' },
] as const;

export const DEMO_USERS: { org: (typeof DEMO_ORGS)[number]['slug']; email: string; name: string; role: Role }[] = [
  { org: 'harrow-ridge', email: 'operator@harrow.example', name: 'Dana Okafor', role: 'operator' },
  { org: 'harrow-ridge', email: 'supervisor@harrow.example', name: 'Mitch Varga', role: 'supervisor' },
  { org: 'harrow-ridge', email: 'trainer@harrow.example', name: 'Priya Lindqvist', role: 'trainer' },
  { org: 'harrow-ridge', email: 'admin@harrow.example', name: 'Sol Brennan', role: 'admin' },
  { org: 'harrow-ridge', email: 'operator2@harrow.example', name: 'Tomas Reyes', role: 'operator' },
  { org: 'cobalt-flats', email: 'operator@cobalt.example', name: 'Jules Amari', role: 'operator' },
];
