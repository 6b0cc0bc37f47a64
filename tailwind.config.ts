import type { Config } from 'tailwindcss';

/**
 * Knitwright's design tokens: calm warm-neutral surfaces, one deep teal accent used for the
 * primary action and the selection only, Inter throughout with tabular figures for numbers.
 */
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        surface: '#f6f5f2',
        panel: '#ffffff',
        line: '#dedbd4',
        ink: '#1d1f1e',
        muted: '#5d605c',
        accent: { DEFAULT: '#1f6f66', strong: '#17564f', soft: '#e3f0ee' },
        danger: '#a3261d',
        warn: '#8a5a00',
      },
      fontFamily: {
        sans: ['Inter', 'system-ui', 'sans-serif'],
      },
      minHeight: { touch: '44px' },
      minWidth: { touch: '44px' },
    },
  },
} satisfies Config;
