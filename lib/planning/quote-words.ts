/**
 * What a quote says about the copy of the layout it was priced from — an approved revision, a
 * revision not approved when it was sent, or the preliminary layout — in the same words on the
 * quote page, its PDF and the confirmation before sending. Pure words; must never import React,
 * Next or the database.
 */

/** The line a quote carries about its revision, shared by the page and the PDF. */
export function quoteRevisionWords(revision: { letter: string; approved: boolean } | null, layoutVersion: number): { line: string; unapproved: string | null } {
  if (!revision) {
    return {
      line: `Priced from the preliminary layout (version ${layoutVersion})`,
      unapproved: 'This quote is priced from the preliminary layout: no revision of it had been approved when it was sent.',
    };
  }
  return {
    line: `Priced from revision ${revision.letter}${revision.approved ? ' (approved)' : ''}`,
    unapproved: revision.approved ? null : `Revision ${revision.letter} had not been approved when this quote was sent; the price may change with the approved revision.`,
  };
}

