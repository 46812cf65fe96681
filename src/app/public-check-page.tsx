import { QueryClientProvider } from '@tanstack/react-query';
import { FlaskConical } from 'lucide-react';
import { useEffect, useState } from 'react';
import { registerSW } from 'virtual:pwa-register';
import { Brand, brandClass, createAccountClass, headerBarClass, headerClass, mainClass, navClass, navItemClass, navListClass, signInClass, SiteFooter } from '@/components/ui/site-frame';
import { PublicCheck, type PageLink } from '@/features/late-boil/components/public-check';
import { createQueryClient } from '@/lib/query-client';

/** Links into the app: a full page load, which the app's own page answers. */
const PlainLink: PageLink = ({ to, className, children }) => (
  <a href={to} className={className}>
    {children}
  </a>
);

/** The frame of a signed-out app page around the public check (src/public-check.tsx). */
export function PublicCheckPage() {
  const [queryClient] = useState(createQueryClient);
  useEffect(() => {
    if ('serviceWorker' in navigator) void registerSW({ immediate: true });
  }, []);
  return (
    <QueryClientProvider client={queryClient}>
      <div className="flex min-h-screen flex-col">
        <header className={headerClass}>
          <div className={headerBarClass}>
            <a href="/" className={brandClass}>
              <Brand />
            </a>
            <div className="ml-auto flex items-center gap-1">
              <a href="/sign-in" className={signInClass}>
                Sign in
              </a>
              <a href="/sign-up" className={createAccountClass}>
                Create account
              </a>
            </div>
          </div>
          <nav id="main-nav" aria-label="Main" className={`${navClass} block`}>
            <ul className={navListClass}>
              <li>
                <a href="/late-boil-check" aria-current="page" className={navItemClass(true)}>
                  <FlaskConical aria-hidden className="size-4" />
                  Late-boil check
                </a>
              </li>
            </ul>
          </nav>
        </header>
        <main className={mainClass}>
          <PublicCheck Link={PlainLink} />
        </main>
        <SiteFooter />
      </div>
    </QueryClientProvider>
  );
}
