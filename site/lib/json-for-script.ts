// JSON to place inside <script type="application/json">: "<" and the line separators escaped, so no text
// in the data (a family named "</script>", say) can end the element early.
export function jsonForScript(value: unknown): string {
  return JSON.stringify(value)
    .replace(/</g, '\\u003c')
    .replace(/\u2028/g, '\\u2028')
    .replace(/\u2029/g, '\\u2029');
}
