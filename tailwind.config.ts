import type { Config } from 'tailwindcss';

/**
 * Probity design tokens. Surfaces are a cool paper grey with a deep slate-green brand;
 * result states use the Okabe–Ito colour-blind-safe palette and always come with an
 * icon shape and a word (components/ui/status-badge.tsx).
 */
export default {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        canvas: '#F3F4F1',
        surface: '#FFFFFF',
        sunken: '#EBEDE8',
        line: '#D6DAD2',
        'line-strong': '#A7AEA2',
        ink: '#1A201B',
        'ink-muted': '#535C51',
        'ink-faint': '#737B70',
        brand: { DEFAULT: '#2C5A4E', strong: '#1F4238', soft: '#E2EDE8' },
        focus: '#0072B2',
        danger: { DEFAULT: '#A3390A', soft: '#FBEDE5' },
        status: {
          conforming: '#009E73',
          marginal: '#E69F00',
          nonconforming: '#D55E00',
          'not-evaluated': '#999999',
          info: '#56B4E9',
        },
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
      fontSize: {
        caption: ['0.75rem', { lineHeight: '1rem', letterSpacing: '0.01em' }],
        small: ['0.8125rem', { lineHeight: '1.25rem' }],
        body: ['0.9375rem', { lineHeight: '1.5rem' }],
        title: ['1.125rem', { lineHeight: '1.625rem', fontWeight: '600' }],
        heading: ['1.5rem', { lineHeight: '2rem', fontWeight: '650', letterSpacing: '-0.01em' }],
        display: ['2rem', { lineHeight: '2.5rem', fontWeight: '700', letterSpacing: '-0.02em' }],
      },
      spacing: { gutter: '1.25rem', rail: '15rem' },
      borderRadius: { control: '0.375rem', card: '0.625rem' },
      boxShadow: { card: '0 1px 2px rgb(26 32 27 / 0.07), 0 0 0 1px rgb(26 32 27 / 0.04)' },
    },
  },
} satisfies Config;
