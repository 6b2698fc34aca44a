import type { Config } from 'tailwindcss';

// Ketbook's own palette: ink for text, slate-blue "ket" for actions, amber for cautions.
const config: Config = {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        ink: { DEFAULT: '#1c2333', soft: '#4a5468' },
        ket: { 50: '#eef3fb', 100: '#d8e3f5', 500: '#3b5ea8', 600: '#2f4d8e', 700: '#263f74' },
        caution: { 50: '#fff8e6', 500: '#b7791f', 700: '#7c5210' },
      },
      fontFamily: { sans: ['Inter', 'system-ui', 'sans-serif'] },
    },
  },
};
export default config;
