import type { Config } from 'tailwindcss';

/**
 * Trayline's design tokens. Kitchen-readable: ink on an oat-paper tone, a hot accent scale for ovens and
 * temperatures, a cool accent for the fridge, storage and eat-by dates, and a signal colour for warnings
 * (always paired with an icon and words). Components use these names, never raw colour values.
 */
export default {
  content: ['./src/**/*.{ts,tsx,html}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#F5F0E6', deep: '#EBE3D3', card: '#FFFCF6' },
        ink: { DEFAULT: '#1E1A16', soft: '#4A4238', faint: '#675C50' },
        line: { DEFAULT: '#D9CFBD', strong: '#B9AC95' },
        // Oven scale, warm → hot (bake-run bands).
        oven: { 1: '#F2C14E', 2: '#EE9B3B', 3: '#DF6C2A', 4: '#C2451E', 5: '#8F2A14', DEFAULT: '#C2451E' },
        // Cold chain: fridge, freezer, eat-by.
        frost: { 50: '#EAF4F6', 100: '#CFE6EB', 500: '#2B7A8C', 700: '#1C5563', DEFAULT: '#2B7A8C' },
        herb: { 50: '#EEF5E9', 500: '#4E7D3A', 700: '#365A27', DEFAULT: '#4E7D3A' },
        signal: { 50: '#FDECEA', 500: '#B3261E', 700: '#8A1C16', DEFAULT: '#B3261E' },
        caution: { 50: '#FFF6DB', 500: '#A86B00', 700: '#7A4F00', DEFAULT: '#A86B00' },
      },
      fontFamily: {
        sans: ['"Atkinson Hyperlegible"', 'system-ui', 'sans-serif'],
        display: ['Fraunces', 'Georgia', 'serif'],
      },
      borderRadius: { tray: '0.9rem' },
      boxShadow: { tray: '0 1px 0 #D9CFBD, 0 6px 18px -10px rgba(30,26,22,0.35)' },
    },
  },
} satisfies Config;
