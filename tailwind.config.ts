import type { Config } from 'tailwindcss';
import defaultTheme from 'tailwindcss/defaultTheme';

// Light neutral base with near-black ink: it holds up under plant glare and office light alike.
// Text pairs (WCAG ratio): ink on surface 16.3, ink-muted on surface 7.5, white on accent 7.6,
// each verdict colour on white ≥ 6.3 and on its soft tint ≥ 5.5; surface-edge (input borders) 5.0.
export default {
  content: ['./index.html', './src/**/*.{ts,tsx}'],
  theme: {
    extend: {
      fontFamily: {
        sans: ['Inter', ...defaultTheme.fontFamily.sans],
      },
      colors: {
        surface: {
          DEFAULT: '#F5F6F7',
          raised: '#FFFFFF',
          sunken: '#EBEDF0',
          line: '#D3D7DC',
          edge: '#66707A',
        },
        ink: {
          DEFAULT: '#15191E',
          muted: '#48515B',
          inverse: '#FFFFFF',
        },
        accent: {
          DEFAULT: '#1F4BB8',
          strong: '#173A8F',
          soft: '#E7EDFB',
          ink: '#FFFFFF',
        },
        verdict: {
          in_band: { DEFAULT: '#1B6E34', soft: '#E6F4EA' },
          near_edge: { DEFAULT: '#8A5300', soft: '#FDF1DC' },
          out_of_band: { DEFAULT: '#B3261E', soft: '#FCE8E6' },
          open: { DEFAULT: '#6A3D9A', soft: '#F1EAF8' },
          short: { DEFAULT: '#8E1D5C', soft: '#F8E6EF' },
        },
        // ANSI Z535 signal-word colours: DANGER white on red, WARNING and CAUTION black on orange and yellow.
        danger: { DEFAULT: '#C8102E', ink: '#FFFFFF', soft: '#FBE9EC' },
        warning: { DEFAULT: '#FF7900', ink: '#000000', soft: '#FFF1E5' },
        caution: { DEFAULT: '#FFD100', ink: '#000000', soft: '#FFF9DB' },
        // NOTICE (property damage, not injury): white on safety blue, without the safety alert symbol.
        notice: { DEFAULT: '#0B4F9C', ink: '#FFFFFF', soft: '#EAF1FA' },
      },
      minHeight: {
        touch: '3rem',
      },
      minWidth: {
        touch: '3rem',
      },
    },
  },
  plugins: [],
} satisfies Config;
