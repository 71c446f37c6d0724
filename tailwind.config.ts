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
      },
      fontFamily: {
        sans: ['Nunito', 'ui-sans-serif', 'system-ui', 'sans-serif'],
      },
    },
  },
} satisfies Config;
