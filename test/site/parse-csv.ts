// A small RFC 4180 reader for the tests (quoted fields with commas, doubled quotes and line breaks;
// records end in CRLF): an independent reading of what the site's CSV writers produce.
export function parseCsvRecords(text: string): string[][] {
  const records: string[][] = [];
  let record: string[] = [];
  let field = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') { field += '"'; i++; }
      else if (c === '"') quoted = false;
      else field += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') { record.push(field); field = ''; }
    else if (c === '\r' && text[i + 1] === '\n') { record.push(field); records.push(record); record = []; field = ''; i++; }
    else field += c;
  }
  if (field !== '' || record.length > 0) { record.push(field); records.push(record); }
  return records;
}
