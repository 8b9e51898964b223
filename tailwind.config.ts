import type { Config } from 'tailwindcss'

export default {
  content: ['./app/**/*.{vue,ts}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['Inter', 'system-ui', 'sans-serif'],
        mono: ['"Roboto Mono"', 'ui-monospace', 'monospace'],
      },
      colors: {
        // Ionfolio's own palette: a deep teal for the frame, amber for cautions.
        ink: { 50: '#f3f7f7', 100: '#dde9ea', 200: '#b9d3d5', 300: '#8db6ba', 400: '#5e9298', 500: '#43767d', 600: '#355f66', 700: '#2d4e54', 800: '#263f44', 900: '#1b2e32' },
      },
    },
  },
} satisfies Config
