/**
 * Wortwise design tokens. Tailwind 4 reads this file through `@config` in src/index.css.
 * Palette: "cellar" greens for structure, "malt" ambers for action, a warm paper surface.
 * @type {import('tailwindcss').Config}
 */
export default {
  content: ['./index.html', './late-boil-check.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['"Source Sans 3"', 'system-ui', 'sans-serif'],
      },
      colors: {
        paper: '#fbf8f3',
        // Every colour used for text reaches WCAG 2 AA against paper, white and each 50/100 tint:
        // at least 4.5:1 for body text (ink-faint 4.66:1 on cellar-100, its worst background), and
        // at least 3:1 for large text (malt-500 is only used large or as a fill).
        ink: { DEFAULT: '#1d2624', soft: '#4a5753', faint: '#5a6663' },
        cellar: { 50: '#eef5f3', 100: '#d6e7e2', 300: '#8fbfb2', 500: '#336b5e', 700: '#1f3b36', 900: '#122421' },
        malt: { 50: '#fdf6e7', 100: '#f9e6bd', 300: '#efc670', 500: '#b27416', 600: '#9a6415', 700: '#8c5a12' },
        alert: { 50: '#fdf0ee', 500: '#c2412d', 700: '#8f2a1b' },
        ok: { 50: '#eef7ee', 500: '#2f7a33', 700: '#25602a' },
      },
      minHeight: { touch: '44px' },
      minWidth: { touch: '44px' },
    },
  },
};
