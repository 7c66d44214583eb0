import type { Config } from 'tailwindcss';

/**
 * Gridkeep's design tokens. Colours are the product's own: a deep teal-slate "ink" for the
 * shell and text, a warm amber for actions, quiet stone greys for surfaces, and one
 * foreground/background pair per state. Every text pair meets WCAG 2.2 AA (4.5:1); the pairs
 * are checked in src/config/theme-contrast.test.ts.
 */
export const palette = {
  ink: {
    50: '#f1f6f6',
    100: '#dde9ea',
    200: '#b9d2d4',
    300: '#8fb3b7',
    400: '#5f8c92',
    500: '#437078',
    600: '#335a62',
    700: '#284a51',
    800: '#1c3d44',
    900: '#12343b',
    950: '#0b2227',
  },
  amber: {
    50: '#fff8ea',
    100: '#feedc6',
    200: '#fcd98c',
    300: '#f8c15c',
    400: '#f4a62a',
    500: '#e18a0f',
    600: '#bf6a0a',
    700: '#a04a0a',
    800: '#80390f',
    900: '#69300f',
  },
  stone: {
    0: '#ffffff',
    50: '#f6f7f6',
    100: '#eceeed',
    200: '#dde1e0',
    300: '#c4cbca',
    400: '#879291',
    500: '#677473',
    600: '#525e5d',
    700: '#3d4847',
    800: '#293231',
    900: '#1a2120',
  },
  danger: { 50: '#fdeeee', 100: '#fbdcdd', 600: '#b4232c', 700: '#931c24' },
  /** Text colour (DEFAULT), tinted background (bg) and a stronger mark (dot) per state. */
  state: {
    // Service-plan clock
    'on-track': { DEFAULT: '#1b6b3a', bg: '#e2f3e7', dot: '#2f9a57' },
    'at-risk': { DEFAULT: '#8a4a00', bg: '#fcefd3', dot: '#e18a0f' },
    breached: { DEFAULT: '#a3222b', bg: '#fde5e6', dot: '#d8343f' },
    // Cabinet states
    installed: { DEFAULT: '#135e62', bg: '#dcf2f0', dot: '#1e8a8f' },
    spare: { DEFAULT: '#1f4e8c', bg: '#e2ecfa', dot: '#3b74c4' },
    'at-bench': { DEFAULT: '#5a3d97', bg: '#eee7fa', dot: '#7d5bc8' },
    returned: { DEFAULT: '#8a4216', bg: '#fae8dc', dot: '#c2652a' },
    retired: { DEFAULT: '#4a5352', bg: '#eceeee', dot: '#7d8786' },
    'open-ticket': { DEFAULT: '#9a1c4f', bg: '#fbe3ed', dot: '#cc3370' },
  },
} as const;

export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    colors: {
      transparent: 'transparent',
      current: 'currentColor',
      white: '#ffffff',
      black: '#000000',
      ...palette,
    },
    fontFamily: {
      sans: ['"Work Sans"', 'system-ui', '-apple-system', 'Segoe UI', 'Roboto', 'sans-serif'],
      mono: ['ui-monospace', 'SFMono-Regular', 'Menlo', 'Consolas', 'monospace'],
    },
    // A compact scale: 13 px for dense tables, 15 px body, 16 px in inputs (no zoom on phones).
    fontSize: {
      '2xs': ['0.6875rem', { lineHeight: '1rem', letterSpacing: '0.02em' }],
      xs: ['0.75rem', { lineHeight: '1rem' }],
      sm: ['0.8125rem', { lineHeight: '1.25rem' }],
      base: ['0.9375rem', { lineHeight: '1.5rem' }],
      md: ['1rem', { lineHeight: '1.5rem' }],
      lg: ['1.125rem', { lineHeight: '1.625rem' }],
      xl: ['1.25rem', { lineHeight: '1.75rem', letterSpacing: '-0.005em' }],
      '2xl': ['1.5rem', { lineHeight: '2rem', letterSpacing: '-0.01em' }],
      '3xl': ['1.875rem', { lineHeight: '2.375rem', letterSpacing: '-0.015em' }],
    },
    extend: {
      spacing: {
        /**
         * The smallest touch target (WCAG 2.2 SC 2.5.5 AAA asks 44 × 44 CSS px). In px, not rem:
         * the root font is 15 px, where 2.75rem would be 41.25 px.
         */
        touch: '44px',
        'touch-lg': '3.5rem',
        sidebar: '15rem',
        topbar: '3.5rem',
      },
      minHeight: { touch: '44px', 'touch-lg': '3.5rem' },
      minWidth: { touch: '44px' },
      maxWidth: { prose: '65ch', form: '28rem' },
      borderRadius: { DEFAULT: '0.375rem', md: '0.5rem', lg: '0.75rem' },
      boxShadow: {
        card: '0 1px 2px rgba(11, 34, 39, 0.06), 0 1px 3px rgba(11, 34, 39, 0.08)',
        pop: '0 8px 24px rgba(11, 34, 39, 0.16), 0 2px 6px rgba(11, 34, 39, 0.08)',
      },
      keyframes: {
        progress: { '0%': { transform: 'translateX(-100%)' }, '100%': { transform: 'translateX(250%)' } },
      },
      animation: { progress: 'progress 1.1s ease-in-out infinite' },
    },
  },
  plugins: [],
} satisfies Config;
