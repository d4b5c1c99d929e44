import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound, redirect } from 'next/navigation';
import { currentActor } from '@/server/auth/session';
import { NotFoundError } from '@/db/errors';
import { PAPER_MM } from '@/lib/sheet';
import { runJob, WorkPoolBusyError } from '@/lib/workers/pool';
import { sheetQuerySchema, sheetRequestFor } from '@/server/sheet/sheet-request';
import { SheetSvg } from '@/components/sheet/SheetSvg';
import { SheetControls } from '@/components/sheet/SheetControls';
import { UploadsPanel } from '@/components/uploads/UploadsPanel';

export const metadata: Metadata = { title: 'Plan sheet' };

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/**
 * The printable plan sheet: the same pages as the PDF, drawn as SVG in real millimetres so the
 * browser prints them true to scale at 100 %; the bar above and the reference files beside it
 * are left out of print.
 */
export default async function SheetPage({ params, searchParams }: Props) {
  const actor = await currentActor();
  if (!actor) redirect('/sign-in');
  const { id } = await params;
  const raw = Object.fromEntries(Object.entries(await searchParams).filter((e): e is [string, string] => typeof e[1] === 'string'));
  const parsed = sheetQuerySchema.safeParse(raw);
  const query = parsed.success ? parsed.data : sheetQuerySchema.parse({});
  const ctx = await sheetRequestFor(actor, id, query.revision).catch((err) => {
    if (err instanceof NotFoundError) notFound();
    throw err;
  });
  const composed = await runJob('sheet', { ...ctx.request, paper: query.paper, scale: query.scale }).catch((err: unknown) => {
    if (err instanceof WorkPoolBusyError) return err;
    throw err;
  });
  if (composed instanceof WorkPoolBusyError) {
    return (
      <div role="alert" className="panel m-6 max-w-2xl border-ochre bg-ochre-light p-4 text-sm text-ink" data-testid="sheet-busy">
        <p className="mb-2 font-semibold">The server is busy drawing other plan sheets.</p>
        <p className="mb-3">Try again in {composed.retryAfterSeconds} s; nothing was lost.</p>
        <Link className="btn-primary" href={`/layouts/${ctx.layoutId}/sheet?paper=${query.paper}&scale=${query.scale}${query.revision ? `&revision=${query.revision}` : ''}`}>
          Try again
        </Link>
      </div>
    );
  }
  const result = composed;
  const paper = PAPER_MM[query.paper];
  const canEdit = actor.role !== 'client';

  return (
    <div className="sheet-view min-h-[calc(100vh-48px)] bg-paper-deep">
      <style>{`
        @page { size: ${paper.label} landscape; margin: 0; }
        @media print {
          header, .no-print { display: none !important; }
          html, body, .sheet-view { background: white !important; }
          .min-h-screen, .sheet-view { min-height: 0 !important; }
          .sheet-body, .sheet-stack { display: block !important; padding: 0 !important; margin: 0 !important; gap: 0 !important; }
          .sheet-page { box-shadow: none !important; break-after: page; width: ${paper.width}mm !important; height: ${paper.height}mm !important; max-width: none !important; }
          .sheet-page:last-child { break-after: auto; }
        }
      `}</style>
      <SheetControls
        layoutId={ctx.layoutId}
        paper={query.paper}
        scale={query.scale}
        revision={ctx.printed?.letter ?? null}
        revisions={ctx.revisions.map((r) => ({ letter: r.letter, state: r.state }))}
        defaultRevision={ctx.defaultRevision}
        canDownload={result.ok}
      />
      {!parsed.success && (
        <p role="alert" className="no-print mx-4 mt-3 rounded-sm border border-ochre bg-ochre-light px-3 py-2 text-sm text-ink">
          That paper, scale or revision is not one we can print; showing {ctx.printed ? `revision ${ctx.printed.letter}` : 'the preliminary layout (as last saved)'} on A4 at 1:20. Choose from the lists above.
        </p>
      )}
      <div className="sheet-body flex flex-col gap-4 p-4 xl:flex-row xl:items-start">
        <main className="sheet-stack flex min-w-0 flex-1 flex-col items-center gap-6" aria-label="Plan sheet pages">
          {result.ok ? (
            result.sheet.pages.map((page, i) => (
              <SheetSvg key={i} page={page} number={i + 1} label={`Sheet ${i + 1} of ${result.sheet.pages.length}, ${paper.label} landscape at 1:${query.scale}`} />
            ))
          ) : (
            <div role="alert" className="panel max-w-2xl border-brick bg-brick-light p-4 text-sm text-ink" data-testid="sheet-does-not-fit">
              <p className="mb-2 font-semibold">The bay does not fit this paper at 1:{query.scale}.</p>
              <p className="mb-3">{result.message}</p>
              {result.suggestion && (
                <Link className="btn-primary" href={`/layouts/${ctx.layoutId}/sheet?paper=${result.suggestion.paper}&scale=${result.suggestion.scale}${query.revision ? `&revision=${query.revision}` : ''}`}>
                  Show it at 1:{result.suggestion.scale} on {PAPER_MM[result.suggestion.paper].label}
                </Link>
              )}
            </div>
          )}
        </main>
        <aside className="no-print w-full shrink-0 xl:w-80">
          <UploadsPanel layoutId={ctx.layoutId} canEdit={canEdit} />
        </aside>
      </div>
    </div>
  );
}
