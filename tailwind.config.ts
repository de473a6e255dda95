import type { Config } from 'tailwindcss';

// Sillmark's sheet: warm paper, ink, one accent (a deep river teal), status always in words and icons too.
const config: Config = {
  content: ['./src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#faf8f3', edge: '#ece7db', deep: '#f2eee4' },
        ink: { DEFAULT: '#1f2a2e', soft: '#4a5a60', faint: '#5d6b70' },
        accent: { DEFAULT: '#17636b', strong: '#0f4b52', wash: '#e3f0ef' },
        verdict: { pass: '#2f6b3a', fail: '#a33a2a', caution: '#8a6212' },
      },
      fontFamily: {
        sans: ['var(--font-sans)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-mono)', 'ui-monospace', 'monospace'],
      },
      maxWidth: { sheet: '72rem' },
    },
  },
};

export default config;
