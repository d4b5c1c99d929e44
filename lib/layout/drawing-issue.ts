/**
 * Where a drawing stands with its client, in the drawing office's words — one vocabulary for the
 * layouts table, the badges, the title block, the viewer, mail and compare. A layout is
 * *preliminary* until a revision is issued; an issued revision is *issued for approval*, then
 * *approved* or *returned for changes* (with the client's words).
 * The ids are stored data and never change: `draft`, `sent`, `changes-asked`, `approved`.
 * Pure words; must never import React, Next or the database.
 */

export type RevisionState = 'sent' | 'changes-asked' | 'approved';
export type LayoutState = 'draft' | RevisionState;

export const ISSUE_STATE_WORD: Record<LayoutState, string> = {
  draft: 'Preliminary',
  sent: 'Issued for approval',
  'changes-asked': 'Returned for changes',
  approved: 'Approved',
};

/** The layout as it stands (not an issued revision), wherever it is offered beside revisions. */
export const PRELIMINARY_WORD = 'Preliminary';
export const AS_LAST_SAVED = 'Preliminary, as last saved';

/** "Revision B · Approved", or "Preliminary" for a layout with no revision on show. */
export function issueWords(letter: string | null | undefined, state?: LayoutState | null): string {
  if (!letter) return PRELIMINARY_WORD;
  const s = state && state !== 'draft' ? ` · ${ISSUE_STATE_WORD[state]}` : '';
  return `Revision ${letter}${s}`;
}

/** Button words for the client's two answers to an issued revision. */
export const decisionWords = (letter: string) => ({
  approve: `Approve revision ${letter}`,
  return: 'Return for changes',
  returnConfirm: `Return revision ${letter} for changes`,
});

/** The letter after `last` (A → B, Z → AA, AZ → BA), or A when nothing has been issued. */
export function nextRevisionLetter(last: string | null | undefined): string {
  if (!last) return 'A';
  const chars = last.split('');
  let i = chars.length - 1;
  while (i >= 0 && chars[i] === 'Z') { chars[i] = 'A'; i--; }
  if (i < 0) return `A${chars.join('')}`;
  chars[i] = String.fromCharCode(chars[i].charCodeAt(0) + 1);
  return chars.join('');
}

/** The words after a revision's state when the layout has been saved since it was issued. */
export const CHANGED_SINCE = 'changed since';

/** "Approved B · changed since": where a layout stands when it has moved on from its latest revision. */
export function changedSinceWords(letter: string, state: RevisionState): string {
  return `${ISSUE_STATE_WORD[state]} ${letter} · ${CHANGED_SINCE}`;
}

/** An issued revision as the choice of documents sees it. */
export interface IssuedRevisionFacts {
  letter: string;
  state: RevisionState;
}

/**
 * Which revision the plan sheet, its PDF, the parts list, the cut list and the quote are made
 * from when nobody chose: the latest approved, else the latest issued; null (the preliminary
 * layout) only when nothing has been issued. `newestFirst` as the revisions list gives them.
 */
export function documentsRevision(newestFirst: readonly IssuedRevisionFacts[]): string | null {
  return (newestFirst.find((r) => r.state === 'approved') ?? newestFirst[0])?.letter ?? null;
}

/**
 * What the client (and a viewer link that follows the layout) is shown by default: the latest
 * issued revision — the approved one until the next is issued — or the layout as it stands
 * while nothing has been issued.
 */
export function clientRevision(newestFirst: readonly IssuedRevisionFacts[]): string | null {
  return newestFirst[0]?.letter ?? null;
}

/** How a chooser names the layout as it stands beside its issued revisions. */
export const PRELIMINARY_CHOICE = 'preliminary';
