import Link from 'next/link';
import { Wordmark } from '@/components/ui/Wordmark';
import { DEMO_ACCOUNTS } from '@/lib/demo-accounts';
import { ONE_LINE_CAUTION } from '@/lib/layout/cautions';
import { CautionNote } from '@/components/ui/CautionNote';

export const dynamic = 'force-dynamic';

export default function Home() {
  const demo = process.env.BAYWRIGHT_DEMO === '1';
  return (
    <main className="sheet min-h-screen">
      <header className="mx-auto flex max-w-5xl items-center justify-between px-6 py-5">
        <Wordmark className="text-lg" />
        <nav className="flex gap-3 text-sm">
          <Link href="/sign-in" className="btn-quiet">Sign in</Link>
          <Link href="/sign-up" className="btn-primary">Start a studio</Link>
        </nav>
      </header>
      <section className="mx-auto max-w-5xl px-6 pb-16 pt-10">
        <h1 className="max-w-3xl text-4xl font-semibold leading-tight">
          Plan the inside of a panel van to the millimetre, and know it will work before anyone cuts a board.
        </h1>
        <p className="mt-5 max-w-2xl text-lg text-ink-soft">
          Draw the bay to scale, place the bed, kitchen, seats, tanks and electrics, switch between travel, lounge and
          sleep, and let the server check what fits: walkways, standing headroom after insulation, bed length once the
          seats are made up, weight and power. Share a view-only link with your client and hand the workshop a plan
          sheet.
        </p>
        <ul className="mt-8 grid max-w-3xl gap-3 text-sm sm:grid-cols-3">
          {[
            ['To scale', 'Bare metal, wheel arches, doors and the build-up of floor, walls and roof.'],
            ['Checked', 'Every finding says what was measured, what was needed and where the rule comes from.'],
            ['Shared', 'Clients follow along, leave mark-ups on the drawing and approve a revision.'],
          ].map(([title, text]) => (
            <li key={title} className="panel p-4">
              <p className="font-medium">{title}</p>
              <p className="mt-1 text-ink-soft">{text}</p>
            </li>
          ))}
        </ul>
        <div className="mt-6 max-w-3xl"><CautionNote testId="start-caution">{ONE_LINE_CAUTION}</CautionNote></div>
        {demo && (
          <div className="panel mt-10 max-w-3xl p-5">
            <h2 className="font-medium">Try the demo workshop</h2>
            <p className="mt-1 text-sm text-ink-soft">
              Saltmarsh Van Works is an invented workshop with three layouts. Every demo account uses the password{' '}
              <code className="font-mono">{DEMO_ACCOUNTS[0].password}</code>.
            </p>
            <ul className="mt-3 grid gap-2 text-sm sm:grid-cols-2">
              {DEMO_ACCOUNTS.map((a) => (
                <li key={a.email}>
                  <Link className="text-copper underline" href={`/sign-in?email=${encodeURIComponent(a.email)}`}>
                    {a.name}
                  </Link>{' '}
                  <span className="text-ink-soft">— {a.what}</span>
                </li>
              ))}
            </ul>
          </div>
        )}
      </section>
    </main>
  );
}
