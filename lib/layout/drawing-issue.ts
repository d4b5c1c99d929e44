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
