// CSV meant for spreadsheets: a text field that begins with =, +, -, @, a tab or a carriage return is
// defused with a leading apostrophe (common practice; OWASP "CSV Injection"), numbers stay numbers.
// Read back with vega's CSV reader (d3-dsv, an independent RFC 4180 parser).
import { read as readTable } from 'vega';
import { describe, expect, it } from 'vitest';
import { formatCsvField, formatCsvRecord } from '../../catalog-db/csv-field.ts';
import { exportCatalogCsv } from '../../catalog-db/export-catalog.ts';
import { openCatalogForRead, openCatalogForWrite } from '../../catalog-db/open-catalog.ts';
import { makeBundle, makeRunInput, makeScenario, makeSystem } from './make-rows.ts';
import { useTempCatalogDir } from './temp-catalog-path.ts';

const catalogPath = useTempCatalogDir();

describe('CSV fields that a spreadsheet would run as formulas', () => {
  it.each([
    ['=HYPERLINK("http://example.invalid","x")', `"'=HYPERLINK(""http://example.invalid"",""x"")"`],
    ['+1+2', "'+1+2"],
    ['-2+3', "'-2+3"],
    ['@SUM(A1)', "'@SUM(A1)"],
    ['\tx', "'\tx"],
    ['\r=1', `"'\r=1"`],
  ])('defuses %j', (text, field) => {
    expect(formatCsvField(text)).toBe(field);
  });

  it('leaves numbers (negative ones too), plain text and empty fields alone', () => {
    expect(formatCsvRecord([-0.5, -1e-300, 'E2M1', 'a-b', '', null, false])).toBe('-0.5,-1e-300,E2M1,a-b,,,false\r\n');
  });

  it('a family named like a formula reaches the exported CSV defused', () => {
    const path = catalogPath('formula.sqlite');
    const writer = openCatalogForWrite(path);
    writer.upsertSystem(makeSystem());
    writer.setScenario(makeScenario({ name: '=HYPERLINK("http://example.invalid")' }));
    const runId = writer.startRun(makeRunInput());
    const bundle = makeBundle('test-system/B2S1/a', { runId, orbitCount: 2 });
    writer.writeFamily({ ...bundle, family: { ...bundle.family, name: '=HYPERLINK("http://example.invalid","click")' } });
    writer.close();
    const reader = openCatalogForRead(path);
    const csv = exportCatalogCsv(reader);
    reader.close();
    const rows = readTable(csv, { type: 'csv', parse: 'auto' }) as Array<Record<string, unknown>>;
    expect(rows.map((row) => row.familyName)).toEqual([`'=HYPERLINK("http://example.invalid","click")`, `'=HYPERLINK("http://example.invalid","click")`]);
    expect(typeof rows[0]!.x0).toBe('number'); // numbers still parse as numbers
  });
});
