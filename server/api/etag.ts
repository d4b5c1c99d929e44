/**
 * Conditional reads: does a request's If-None-Match name the entity tag we would answer with?
 * (RFC 9110 §13.1.2: a list of tags or `*`, compared weakly, so `W/"7"` matches `"7"`.) Only
 * says whether the tags match; the route must have checked the session and the caller's rights
 * before it answers 304, so a 304 tells a stranger nothing.
 */
export function noneMatchHits(req: Request, etag: string): boolean {
  const header = req.headers.get('if-none-match');
  if (!header) return false;
  const bare = (tag: string) => tag.trim().replace(/^W\//, '');
  const mine = bare(etag);
  return header.split(',').some((t) => t.trim() === '*' || bare(t) === mine);
}
