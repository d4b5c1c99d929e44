/**
 * The bay of a brief, measured by hand: validated with the bay's own limits (the Bay panel's), and
 * searched exactly as the template of the same measurements is.
 */
import { describe, expect, it } from 'vitest';
import { bayTemplate } from '@/lib/layout/templates';
import { briefSchema, generateProposals, TYPICAL_BRIEF } from '@/lib/proposals';

const l3h2 = bayTemplate('l3h2')!.bay;

describe('a measured bay in the brief', () => {
  it('refuses a bay under the 500 mm the Bay panel allows, naming the field', () => {
    const parsed = briefSchema.safeParse({ ...TYPICAL_BRIEF, bay: { source: 'measured', bay: { ...l3h2, length: 400 } } });
    expect(parsed.success).toBe(false);
    const issue = parsed.error!.issues.find((i) => i.path.join('.') === 'bay.bay.length');
    expect(issue?.message).toBe('a bay is at least 500 mm long');
  });

  it('refuses a wheel arch that runs past the rear of the bay', () => {
    // Arch from 3000 mm, 950 mm long: ends at 3950 mm, past the 3800 mm bay.
    const arches = l3h2.wheelArches.map((a) => ({ ...a, x: 3000 }));
    const parsed = briefSchema.safeParse({ ...TYPICAL_BRIEF, bay: { source: 'measured', bay: { ...l3h2, wheelArches: arches } } });
    expect(parsed.success).toBe(false);
    expect(parsed.error!.issues.some((i) => i.path.join('.') === 'bay.bay.wheelArches.0.length')).toBe(true);
  });

  it('gives the same proposals as the template with the same measurements', () => {
    const measured = generateProposals(briefSchema.parse({ ...TYPICAL_BRIEF, bay: { source: 'measured', bay: l3h2 } }));
    const template = generateProposals(briefSchema.parse({ ...TYPICAL_BRIEF, bay: { source: 'template', template: 'l3h2' } }));
    expect(measured.ok).toBe(true);
    expect(measured.proposals.map((p) => p.doc.modules)).toEqual(template.proposals.map((p) => p.doc.modules));
  }, 60_000);
});
