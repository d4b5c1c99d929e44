/**
 * The words under a comparison's two plans: what changed, module by module (by label, fields by
 * their on-screen names), opening by opening (windows, roof openings, body points: added, removed,
 * moved, resized) and in the bay, and the check findings whose status changed — with the
 * safety caution when a gas, power, heating, seat or weight finding is among them. Shared by the
 * revision compare and the variant compare. Presentation only.
 */
import { ArrowDownRight, ArrowUpRight } from 'lucide-react';
import { bayChangeWords, moduleChangeWords, openingChangeWords, openingWords } from '@/lib/layout/revision-words';
import { moduleLabel } from '@/lib/layout/kinds';
import { findingTopic, TOPIC_CAUTION, type HazardTopic } from '@/lib/layout/cautions';
import { formatLength, type LengthUnit } from '@/lib/layout/units';
import type { ComparisonDto } from '@/db/sharing/compare';
import { CautionNote } from '@/components/ui/CautionNote';
import { StatusInline } from '@/components/checks/FindingParts';
import { ruleName } from '@/lib/checks/words';
import { RevisionMarkIcon } from './RevisionMarkIcon';

function Status({ s, side }: { s: 'pass' | 'warn' | 'fail' | null; side: 'before' | 'after' }) {
  if (!s) return <span className="text-ink-soft">{side === 'before' ? 'not raised' : 'no longer raised'}</span>;
  return <StatusInline status={s} />;
}

export function ComparisonDetails({ data, markLetter, units, titles = { modules: 'What changed', findings: 'Checks that changed' } }: {
  data: ComparisonDto;
  /** The letter in each change's delta triangle; empty for two variants (no revision). */
  markLetter: string;
  units: LengthUnit;
  titles?: { modules: string; findings: string };
}) {
  const { diff } = data;
  const nothing = !diff.added.length && !diff.removed.length && !diff.changed.length;
  const openings = diff.openings ?? { added: [], removed: [], changed: [] };
  const openingsChanged = openings.added.length + openings.removed.length + openings.changed.length > 0;
  // Openings named in the later layout's terms (a window in a door by its door); a removed one by the earlier's.
  const afterBay = data.to.doc.bay;
  const beforeBay = data.from.doc.bay;
  const topics = [...new Set(data.findings.map((f) => findingTopic(f.id)).filter((t): t is HazardTopic => t !== null))];
  // Between two variants there is no revision letter: a plain copper mark instead of an empty triangle.
  const mark = markLetter
    ? <span className="mt-0.5 text-copper"><RevisionMarkIcon letter={markLetter} /></span>
    : <span className="mt-0.5 text-copper" aria-hidden="true">◆</span>;
  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <section className="panel p-4 text-sm" data-testid="module-changes">
        <h2 className="mb-2 font-semibold">{titles.modules}</h2>
        {nothing ? (
          <p className="text-ink-soft">No module changed ({diff.unchanged} the same){openingsChanged ? '.' : ', and no opening.'}</p>
        ) : (
          <ul className="space-y-1.5">
            {diff.added.map((m) => (
              <li key={`a-${m.id}`} className="flex gap-2">{mark}<span><strong>Added</strong> {moduleLabel(m)} <span className="font-mono text-xs text-ink-soft">{formatLength(m.length, units)} × {formatLength(m.width, units)} × {formatLength(m.height, units)}</span></span></li>
            ))}
            {diff.removed.map((m) => <li key={`r-${m.id}`} className="flex gap-2">{mark}<span><strong>Removed</strong> {moduleLabel(m)}</span></li>)}
            {diff.changed.map((c) => {
              const w = moduleChangeWords(c, units);
              return (
                <li key={`c-${c.id}`} className="flex gap-2">
                  {mark}
                  <span>
                    <strong>{w.verb}</strong> {moduleLabel(c.after)}
                    {w.lines.map((l) => <span key={l} className="block text-xs text-ink-soft">{l}</span>)}
                  </span>
                </li>
              );
            })}
          </ul>
        )}
        {openingsChanged && (
          <div data-testid="opening-changes">
            <h3 className="mb-1 mt-3 font-medium">Openings</h3>
            <ul className="space-y-1.5">
              {openings.added.map((o) => <li key={`oa-${o.id}`} className="flex gap-2">{mark}<span><strong>Added</strong> {openingWords(afterBay, o, units)}</span></li>)}
              {openings.removed.map((o) => <li key={`or-${o.id}`} className="flex gap-2">{mark}<span><strong>Removed</strong> {openingWords(beforeBay, o, units)}</span></li>)}
              {openings.changed.map((c) => {
                const w = openingChangeWords(afterBay, c, units);
                return (
                  <li key={`oc-${c.id}`} className="flex gap-2">
                    {mark}
                    <span>
                      <strong>{w.verb}</strong> {w.name}
                      {w.lines.map((l) => <span key={l} className="block text-xs text-ink-soft">{l}</span>)}
                    </span>
                  </li>
                );
              })}
            </ul>
          </div>
        )}
        {diff.bay.length > 0 && (
          <>
            <h3 className="mb-1 mt-3 font-medium">Bay</h3>
            <ul className="space-y-0.5 text-xs">
              {diff.bay.map((b) => <li key={b.field}>{bayChangeWords(b, units)}</li>)}
            </ul>
          </>
        )}
      </section>
      <section className="panel space-y-3 p-4 text-sm" data-testid="finding-changes">
        <h2 className="font-semibold">{titles.findings}</h2>
        {data.findings.length === 0 ? <p className="text-ink-soft">No finding changed status.</p> : (
          <ul className="space-y-2">
            {data.findings.map((f) => (
              <li key={f.key} className="flex gap-2">
                {f.direction === 'worse' ? <ArrowDownRight size={14} className="mt-0.5 text-brick" aria-label="worse" /> : <ArrowUpRight size={14} className="mt-0.5 text-moss" aria-label="better" />}
                <span>
                  <span className="text-xs font-semibold">{ruleName(f.id)}</span>{f.arrangement ? <span className="text-xs text-ink-soft"> · {f.arrangement}</span> : null}:{' '}
                  <Status s={f.before} side="before" /> → <Status s={f.after} side="after" />
                  <span className="block text-xs text-ink-soft">{f.message}</span>
                </span>
              </li>
            ))}
          </ul>
        )}
        {topics.map((t) => <CautionNote key={t} title={TOPIC_CAUTION[t].title} compact testId="compare-caution">{TOPIC_CAUTION[t].text}</CautionNote>)}
      </section>
    </div>
  );
}
