// A small reader of OEM files in KVN form for the tests (independent of the writer): header and metadata
// keywords, comments, and the "epoch x y z vx vy vz" data lines.

export interface ParsedOem {
  header: Record<string, string>;
  meta: Record<string, string>;
  comments: string[];
  epochs: string[];
  states: number[][];
}

export function parseOem(text: string): ParsedOem {
  const out: ParsedOem = { header: {}, meta: {}, comments: [], epochs: [], states: [] };
  let section: 'header' | 'meta' | 'data' = 'header';
  for (const raw of text.split(/\r?\n/)) {
    const line = raw.trim();
    if (line === '') continue;
    if (line.startsWith('COMMENT')) {
      out.comments.push(line.slice(7).trim());
      continue;
    }
    if (line === 'META_START') { section = 'meta'; continue; }
    if (line === 'META_STOP') { section = 'data'; continue; }
    if (section === 'data') {
      const [epoch, ...numbers] = line.split(/\s+/);
      if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}:\d{2}(\.\d+)?$/.test(epoch) || numbers.length !== 6) {
        throw new Error(`OEM data line not understood: ${line}`);
      }
      out.epochs.push(epoch);
      out.states.push(numbers.map(Number));
      continue;
    }
    const match = /^([A-Z_]+)\s*=\s*(.*)$/.exec(line);
    if (!match) throw new Error(`OEM keyword line not understood: ${line}`);
    (section === 'header' ? out.header : out.meta)[match[1]] = match[2];
  }
  return out;
}
