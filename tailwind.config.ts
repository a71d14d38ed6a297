import type { Config } from 'tailwindcss';

// Arcline palette: slate ink on warm paper, signal amber, deep teal. Chosen for contrast in sunlight.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}', './canvas/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#15202B', soft: '#3A4A5A', muted: '#5F6E7C' },
        paper: { DEFAULT: '#F7F4EE', raised: '#FFFFFF', sunk: '#ECE7DD', line: '#D6CFC2' },
        signal: { DEFAULT: '#F2A900', dark: '#B57E00', light: '#FFE3A3' },
        teal: { DEFAULT: '#0F5C63', dark: '#0A4247', light: '#D5ECEE' },
        over: { DEFAULT: '#B3261E', light: '#FBE3E1' },
        within: { DEFAULT: '#1F6F3A', light: '#DDF1E3' },
      },
      fontFamily: { sans: ['"Inter Tight"', 'system-ui', 'sans-serif'] },
    },
  },
};
export default config;
