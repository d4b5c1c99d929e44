// The two faces: IBM Plex Sans for text, IBM Plex Mono for every dimension (SIL OFL, from @fontsource).
import localFont from 'next/font/local';

export const textFace = localFont({
  src: [
    { path: '../fonts/ibm-plex-sans-latin-400-normal.woff2', weight: '400' },
    { path: '../fonts/ibm-plex-sans-latin-500-normal.woff2', weight: '500' },
    { path: '../fonts/ibm-plex-sans-latin-600-normal.woff2', weight: '600' },
  ],
  variable: '--font-text',
  display: 'swap',
});

export const monoFace = localFont({
  src: [
    { path: '../fonts/ibm-plex-mono-latin-400-normal.woff2', weight: '400' },
    { path: '../fonts/ibm-plex-mono-latin-500-normal.woff2', weight: '500' },
  ],
  variable: '--font-mono',
  display: 'swap',
});
