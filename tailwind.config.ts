// Tailwind theme for Fieldshed: a warm paper workspace, dark ink, one earthy accent.
// Loaded from src/index.css with `@config "../tailwind.config.ts";` (Tailwind 4).
import type { Config } from 'tailwindcss';

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#f7f3ea', deep: '#ede5d3', edge: '#d9cfba' },
        ink: { DEFAULT: '#1f1b16', soft: '#574d42', faint: '#857a6c' },
        // The one accent: a weathered clay umber.
        clay: { DEFAULT: '#8e4f24', dark: '#6d3a17', light: '#f1e0cf' },
        // Messages only, always with words beside them.
        alert: { DEFAULT: '#9a2d1c', light: '#f6dcd4' },
        caution: { DEFAULT: '#7a5300', light: '#f5e6bf' },
      },
      fontFamily: {
        serif: ['"Literata Variable"', 'Georgia', 'serif'],
        sans: ['"Inter Variable"', 'system-ui', 'sans-serif'],
      },
    },
  },
} satisfies Config;
