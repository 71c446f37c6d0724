import type { Config } from 'tailwindcss';

// The Dwell look (docs/glossary.md). Read by Tailwind v4 through `@config` in src/styles/main.css.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        linen: '#FAF7F2',
        ink: '#1E2A36',
        oxide: '#B5532A',
        sage: '#5E8066',
        amber: '#B7791F',
        brick: '#9B2C2C',
        // The edge of a control (fields, chips, secondary buttons): 3:1 or more against white and linen, as WCAG 2.1
        // SC 1.4.11 asks of what shows where a control is (tests/unit/contrast.test.ts).
        edge: '#787F86',
      },
      fontFamily: {
        sans: ['Nunito', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
    },
  },
} satisfies Config;
