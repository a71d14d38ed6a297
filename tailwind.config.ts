import type { Config } from 'tailwindcss';

// Arcline palette: slate ink on warm paper, signal amber, deep teal. Chosen for contrast in sunlight:
// ink on paper is about 15:1, ink-muted on paper about 5:1 (WCAG AA for body text), white on teal about 7.6:1.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './canvas/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#15202B', soft: '#3A4A5A', muted: '#56636F' },
        paper: { DEFAULT: '#F7F4EE', raised: '#FFFFFF', sunk: '#ECE7DD', line: '#D6CFC2', edge: '#B9B0A1' },
        signal: { DEFAULT: '#F2A900', dark: '#8A5F00', light: '#FFE3A3' },
        teal: { DEFAULT: '#0F5C63', dark: '#0A4247', light: '#D5ECEE', bright: '#3FA7AE' },
        over: { DEFAULT: '#B3261E', light: '#FBE3E1' },
        within: { DEFAULT: '#1F6F3A', light: '#DDF1E3' },
      },
      fontFamily: { sans: ['"Inter Tight"', 'system-ui', 'sans-serif'] },
      // Type scale: a 1.2 ratio from a 17 px body, a size up from the usual 16 px because screens are read
      // at arm's length in daylight. Names say the role, not the size.
      fontSize: {
        caption: ['0.8125rem', { lineHeight: '1.25rem', letterSpacing: '0.01em' }],
        label: ['0.9375rem', { lineHeight: '1.375rem', fontWeight: '600' }],
        body: ['1.0625rem', { lineHeight: '1.625rem' }],
        lead: ['1.25rem', { lineHeight: '1.875rem' }],
        heading: ['1.5rem', { lineHeight: '2rem', letterSpacing: '-0.01em', fontWeight: '700' }],
        title: ['2.125rem', { lineHeight: '2.5rem', letterSpacing: '-0.02em', fontWeight: '700' }],
        display: ['3.25rem', { lineHeight: '3.5rem', letterSpacing: '-0.03em', fontWeight: '800' }],
      },
      minHeight: { touch: '2.75rem', 'touch-lg': '3.25rem' },
      minWidth: { touch: '2.75rem' },
      boxShadow: {
        plate: '0 1px 0 #D6CFC2, 0 2px 6px rgba(21, 32, 43, 0.06)',
        lift: '0 10px 30px -12px rgba(21, 32, 43, 0.35)',
      },
      borderRadius: { plate: '0.625rem' },
    },
  },
};
export default config;
