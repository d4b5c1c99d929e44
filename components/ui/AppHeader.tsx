'use client';
// The 48 px bar above every signed-in page.
import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { signOut } from 'next-auth/react';
import { LogOut } from 'lucide-react';
import { Wordmark } from './Wordmark';

const ROLE_WORD = { owner: 'Owner', designer: 'Designer', client: 'Client' } as const;

export function AppHeader({ name, role, showOutbox = false }: { name: string; role: keyof typeof ROLE_WORD; showOutbox?: boolean }) {
  const path = usePathname();
  const links = [
    { href: '/layouts', label: 'Layouts' },
    ...(role !== 'client' ? [{ href: '/clients', label: 'Clients' }] : []),
    { href: '/settings', label: 'Settings' },
    // The development outbox (components/sharing): owners only, never in production.
    ...(showOutbox ? [{ href: '/outbox', label: 'Outbox' }] : []),
  ];
  return (
    <header className="flex h-12 items-center gap-2 border-b border-paper-edge bg-paper px-2 sm:gap-6 sm:px-4">
      <Link href="/layouts" aria-label="Baywright home" className="shrink-0"><Wordmark wordClassName="max-[480px]:hidden" /></Link>
      {/* On the narrowest phones the links scroll within the bar rather than the page sideways. */}
      <nav className="flex min-w-0 gap-1 overflow-x-auto text-sm" aria-label="Main">
        {links.map((l) => {
          const active = path === l.href || path.startsWith(`${l.href}/`);
          return (
            <Link key={l.href} href={l.href} aria-current={active ? 'page' : undefined}
              className={`inline-flex min-h-11 shrink-0 items-center rounded-sm px-1.5 py-1 sm:min-h-0 sm:px-2 ${active ? 'bg-paper-deep font-medium text-ink' : 'text-ink-soft hover:text-ink'}`}>
              {l.label}
            </Link>
          );
        })}
      </nav>
      <div className="ml-auto flex shrink-0 items-center gap-3 text-sm">
        <span className="hidden text-ink-soft md:inline">{name} · {ROLE_WORD[role]}</span>
        <button type="button" className="btn-quiet min-h-11 px-2 py-1 sm:min-h-0" aria-label={`Sign out ${name}`} onClick={() => signOut({ redirectTo: '/' })}>
          <LogOut size={14} aria-hidden="true" /> <span className="hidden sm:inline">Sign out</span>
        </button>
      </div>
    </header>
  );
}
