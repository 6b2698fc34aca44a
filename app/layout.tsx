import '@fontsource/inter/400.css';
import '@fontsource/inter/700.css';
import 'katex/dist/katex.min.css';
import './globals.css';
import type { Metadata } from 'next';
import { SiteHeader } from '@/components/layout/SiteHeader';
import { Providers } from './providers';

export const metadata: Metadata = {
  title: { default: 'Ketbook', template: '%s · Ketbook' },
  description: 'Configuration interaction for small molecules, computed in your browser, shared with your group.',
  icons: { icon: '/icon.svg' },
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body className="min-h-screen font-sans antialiased">
        <a href="#main" className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:rounded focus:bg-white focus:px-3 focus:py-1">
          Skip to content
        </a>
        <Providers>
          <SiteHeader />
          <main id="main" className="mx-auto max-w-4xl px-4 py-8">
            {children}
          </main>
        </Providers>
      </body>
    </html>
  );
}
