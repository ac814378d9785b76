import type { Config } from 'tailwindcss';

/**
 * Gramwatt's own palette, named after things on a high trail:
 * - `scree`   — loose dark rock: text, borders, the dark chrome. 900 on firn-50 is the body text (≈ 15:1).
 * - `moss`    — the one accent: actions, links, the current page, a full cell of stored energy.
 * - `larch`   — autumn larch gold: cautions and warnings (always with words, never colour alone).
 * - `rosehip` — a deep hip red: errors and destructive actions.
 * - `tarn`    — a cold mountain-lake blue: focus rings and information.
 * - `firn`    — old packed snow: the light backgrounds and surfaces.
 * Contrast was chosen for reading in bright sun: body text uses 800–900 shades, never mid greys.
 */
const colors = {
  transparent: 'transparent',
  current: 'currentColor',
  white: '#ffffff',
  black: '#000000',
  scree: {
    50: '#f4f5f5',
    100: '#e4e7e7',
    200: '#c9cfcf',
    300: '#a4adae',
    400: '#7b8788',
    500: '#5d6a6b',
    600: '#4a5556',
    700: '#3b4445',
    800: '#2a3132',
    900: '#1c2122',
    950: '#111516',
  },
  moss: {
    50: '#f1f6ee',
    100: '#dfead8',
    200: '#c0d6b3',
    300: '#99bc86',
    400: '#759f60',
    500: '#588445',
    600: '#446a35',
    700: '#37552c',
    800: '#2e4526',
    900: '#273b22',
    950: '#12200f',
  },
  larch: {
    50: '#fdf8ec',
    100: '#f9ecc9',
    200: '#f2d78f',
    300: '#ebbd55',
    400: '#e4a52f',
    500: '#cf861b',
    600: '#a96514',
    700: '#864a15',
    800: '#6e3c17',
    900: '#5d3218',
  },
  rosehip: {
    50: '#fcf3f2',
    100: '#f9e4e2',
    200: '#f3cdc9',
    300: '#e8a9a2',
    400: '#d97a70',
    500: '#c65446',
    600: '#ab3e31',
    700: '#8f3227',
    800: '#762c24',
    900: '#632a23',
  },
  tarn: {
    50: '#eff7fa',
    100: '#d6ebf2',
    200: '#b1d8e6',
    300: '#7bbbd3',
    400: '#4597b9',
    500: '#2b7b9e',
    600: '#256385',
    700: '#24526d',
    800: '#25455b',
    900: '#223b4d',
  },
  firn: {
    50: '#f6f8f7',
    100: '#edf1f0',
    200: '#dde4e2',
    300: '#c5d0cd',
  },
};

export default {
  // Paths are relative to this file (the repository root), so the client's build finds its sources.
  content: ['./client/index.html', './client/src/**/*.{ts,tsx}'],
  theme: {
    colors,
    extend: {
      fontFamily: {
        sans: ['Lexend', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
      backgroundImage: {
        // A dry day in the day strip: diagonal hatching in the current text colour, so it reads without colour vision.
        'dry-hatch': 'repeating-linear-gradient(135deg, currentColor 0 2px, transparent 2px 7px)',
      },
      boxShadow: {
        card: '0 1px 2px rgb(17 21 22 / 0.06), 0 1px 1px rgb(17 21 22 / 0.04)',
      },
    },
  },
} satisfies Config;
