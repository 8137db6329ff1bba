// The one member numbering of the site and the exports: a member is numbered by its seq, its place along
// the family counted from 0, the same number its orbit id ends in (…/0044 is member #44). Every page,
// finder row, chart and download says "#44" for it; no page counts from 1.

/** "#44" for the member with seq 44. */
export function memberLabel(seq: number): string {
  return `#${seq}`;
}

/** Where a member sits in its family, e.g. "member #44 of 83 (#0 to #82)". */
export function memberPosition(seq: number, memberCount: number): string {
  return `member ${memberLabel(seq)} of ${memberCount} (${memberLabel(0)} to ${memberLabel(memberCount - 1)})`;
}
