import type { Config } from 'tailwindcss';

/**
 * QuietLayer's own palette. Tailwind 4 reads theme tokens from src/index.css (@theme);
 * this file is loaded there with @config so the tokens live in one typed place.
 * Margin colours: teal = quiet (≥ 1.25), amber = close (1–1.25), crimson = over (< 1),
 * always shown with a word beside the colour.
 */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Noto Sans"', 'system-ui', 'sans-serif'],
      },
      colors: {
        // faint is darkened from a lighter grey so small text still passes WCAG AA (≥ 4.5:1) on paper.
        ink: { DEFAULT: '#1d2733', soft: '#4a5868', faint: '#5f6d7c' },
        paper: { DEFAULT: '#f7f8f6', raised: '#ffffff', sunk: '#eceeea' },
        slate: { line: '#d3d8dc' },
        brand: { DEFAULT: '#2d4f6c', dark: '#1f3a52', light: '#dbe6ef' },
        // dark: text on the light tint (badges), ≥ 5.8:1 contrast, WCAG 2.1 SC 1.4.3 AA.
        quiet: { DEFAULT: '#0f766e', light: '#ccece8', dark: '#0b5f58' },
        close: { DEFAULT: '#b45309', light: '#fbe6c8', dark: '#8f4207' },
        over: { DEFAULT: '#b3123c', light: '#f8d3dc', dark: '#9a1034' },
      },
    },
  },
} satisfies Config;
