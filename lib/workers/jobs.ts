/**
 * The work that runs off the request thread, by name: each job is a pure function of plain,
 * cloneable data (it crosses a worker_threads message), run inside a pool worker
 * (lib/workers/job-worker.ts). To move more work off the request thread, add a named job here and
 * call `runJob(name, input)` (lib/workers/pool.ts).
 *
 * Must never import the database, Next, React or `server-only`: a worker has none of them.
 */
import { runChecks, type CheckReport } from '../checks';
import { resolveSettings } from '../checks/settings';
import type { LayoutDoc, LayoutSettings } from '../layout/schema';
import { parseLayoutDoc, type FieldIssue } from '../layout/parse';
import { composeSheet, fitOf, renderPdf, type SheetRequest, type SheetResult } from '../sheet';
import type { SheetFonts } from '../sheet/fonts';
import { composeQuoteDocument, type QuoteDocumentInput } from '../sheet/quote-document';
import { generateProposals, type Brief, type ProposalResult } from '../proposals';

/**
 * What the worker hands a job besides its input: where to report progress, and whether the caller
 * has cancelled (a job that runs long reads it between steps and stops with JobCancelled).
 */
export interface JobContext {
  onProgress?: (done: number, total: number) => void;
  cancelled?: () => boolean;
}

export interface ChecksInput {
  doc: LayoutDoc;
  studioDefaults?: LayoutSettings;
}

export interface CheckInputInput {
  /** A posted document as JSON text, not yet parsed or validated. */
  text: string;
  studioDefaults?: LayoutSettings;
}

export type CheckInputOutput = { ok: true; report: CheckReport } | { ok: false; notJson: true } | { ok: false; issues: FieldIssue[] };

/** A plan sheet's inputs, before the checks: the job runs them with the studio's defaults. */
export type SheetInput = Omit<SheetRequest, 'report' | 'checksUnavailable'> & { studioDefaults?: LayoutSettings };

export type SheetPdfOutput = Exclude<SheetResult, { ok: true }> | { ok: true; pdf: Uint8Array };

function checkedSheet({ studioDefaults, ...given }: SheetInput): SheetResult {
  // The load floor's height above the road: the request's, else the layout's, else the studio's default.
  let request = given;
  if (request.floorAboveRoad === undefined) {
    try {
      request = { ...request, floorAboveRoad: resolveSettings(request.doc, studioDefaults).floorAboveRoad };
    } catch {
      // Studio defaults that are not valid settings: the layout's own setting, else the built-in default (composeSheet's).
    }
  }
  // A bay that fits no paper at this scale is refused with the reason before any check runs.
  if (!fitOf(request.doc, request.paper, request.scale, request.floorAboveRoad).fits) return composeSheet({ ...request, report: null });
  let report: CheckReport | null = null;
  let checksUnavailable: string | undefined;
  try {
    report = runChecks(request.doc, { studioDefaults });
  } catch {
    checksUnavailable = 'the check engine stopped on this layout';
  }
  return composeSheet({ ...request, report, checksUnavailable });
}

export const JOBS = {
  /** The check report of one document. */
  checks: (input: ChecksInput): CheckReport => runChecks(input.doc, { studioDefaults: input.studioDefaults }),
  /**
   * A posted document parsed, validated (and migrated) the way every incoming document is, then
   * checked: parsing, copying and validating thousands of modules is itself tens of milliseconds,
   * so it happens here too (the text crosses to the worker as one string).
   */
  checkInput: (input: CheckInputInput): CheckInputOutput => {
    let raw: unknown;
    try {
      raw = JSON.parse(input.text);
    } catch {
      return { ok: false, notJson: true };
    }
    const parsed = parseLayoutDoc(raw);
    if (!parsed.ok) return { ok: false, issues: parsed.issues };
    return { ok: true, report: runChecks(parsed.value, { studioDefaults: input.studioDefaults }) };
  },
  /** Proposals for a validated brief: at most MAX_CANDIDATES candidates laid out and checked. */
  proposals: (input: { brief: Brief }, context: JobContext = {}): ProposalResult =>
    generateProposals(input.brief, { onProgress: context.onProgress, cancelled: context.cancelled }),

  /** The plan sheet as a drawing model (the print view draws it as SVG). */
  sheet: (input: SheetInput): SheetResult => checkedSheet(input),
  /** The plan sheet as PDF bytes. */
  sheetPdf: async (input: SheetInput & { author: string; fonts: SheetFonts }): Promise<SheetPdfOutput> => {
    const { author, fonts, ...rest } = input;
    const result = checkedSheet(rest);
    if (!result.ok) return result;
    return { ok: true, pdf: await renderPdf(result.sheet, { author, fonts }) };
  },
  /** A sent quote as a PDF document (A4 portrait, the sheet's faces). */
  quotePdf: async (input: { quote: QuoteDocumentInput; author: string; fonts: SheetFonts }): Promise<Uint8Array> =>
    renderPdf(composeQuoteDocument(input.quote), { author: input.author, fonts: input.fonts }),
} as const;

export type JobName = keyof typeof JOBS;
export type JobInput<K extends JobName> = Parameters<(typeof JOBS)[K]>[0];
export type JobOutput<K extends JobName> = Awaited<ReturnType<(typeof JOBS)[K]>>;
