// Catalog ids ("earth-moon/E2M1/a/0042") become URL paths segment by segment. Segments made only of
// safe characters stay as they are; any other segment becomes "~" + hex of its UTF-8 bytes, which a kept
// segment can never look like (no "~" is kept), so two ids never share a path. Runs in Node and the browser.

const SAFE_SEGMENT = /^[A-Za-z0-9_-][A-Za-z0-9._-]*$/;

function encodeSegment(segment: string): string {
  if (SAFE_SEGMENT.test(segment)) return segment;
  let hex = '';
  for (const byte of new TextEncoder().encode(segment)) hex += byte.toString(16).padStart(2, '0');
  return `~${hex}`;
}

/** URL path (no leading or trailing slash) for a catalog id. */
export function idToPath(id: string): string {
  return id.split('/').map(encodeSegment).join('/');
}
