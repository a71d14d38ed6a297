import type { Metadata, Viewport } from 'next';
import '@fontsource/inter-tight/400.css';
import '@fontsource/inter-tight/500.css';
import '@fontsource/inter-tight/600.css';
import '@fontsource/inter-tight/700.css';
import './globals.css';
import { Providers } from '@/components/providers';

export const metadata: Metadata = {
  title: { default: 'Arcline', template: '%s · Arcline' },
  description: 'Lift planning sketches for heavy recovery crews: stability, ground pressure and clearance through the whole swing.',
  icons: { icon: '/arcline-mark.svg' },
};

// Every page renders per request: its scripts carry that response's CSP nonce (proxy.ts), which a page
// prerendered at build time could not.
export const dynamic = 'force-dynamic';

export const viewport: Viewport = { width: 'device-width', initialScale: 1, themeColor: '#15202B' };

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body className="min-h-screen bg-paper font-sans text-ink antialiased">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
