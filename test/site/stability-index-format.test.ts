// One rule for writing a stability index (site/lib/format-stability-index.ts) in the finder's rows, the
// family and orbit pages (formatField of the orbit-field table) and the chart tooltips: |ν| < 1 is
// linearly stable (Hénon 1973, A&A 28), so the text must stay on the value's side of ±1.
import { describe, expect, it } from 'vitest';
import { ORBIT_FIELDS } from '../../catalog-db/orbit-fields.ts';
import { seededRandom } from '../../generator/core/random/seeded-random.ts';
import { chartClasses } from '../../site/charts/chart-classes.ts';
import { memberValues } from '../../site/charts/chart-style.ts';
import { formatField } from '../../site/lib/format-field.ts';
import { formatStabilityIndex } from '../../site/format/format-stability-index.ts';
import { finderRowHtml } from '../../site/scripts/finder/finder-row.ts';

const side = (nu: number) => Math.sign(Math.abs(nu) - 1);
const indexFields = ORBIT_FIELDS.filter((f) => f.key === 'stabilityIndex' || f.key === 'verticalStabilityIndex');

describe('stability index text', () => {
  it('the member of the issue, ν = −0.9999999964, does not read −1 anywhere', () => {
    const nu = -0.9999999964; // value reported in issue 11
    expect(formatStabilityIndex(nu)).toBe('-0.999999996');
    expect(indexFields.length).toBe(2);
    for (const field of indexFields) expect(formatField(field, nu)).toBe('-0.999999996');
    const row = finderRowHtml({ orbitId: 'x/0001', orbit: 'F #1', stabilityIndex: nu, verticalStabilityIndex: 1.0000000002 }, '/');
    expect(row).toContain('>-0.999999996<');
    expect(row).toContain('>1.0000000002<');
    const [tooltip] = memberValues([{ id: 'x', seq: 1, href: '', altKm: 1, nu, nuV: -1.00000000007, jacobi: 3, periodDays: 1 }], chartClasses('in-plane', 'same'));
    expect([tooltip!.nuText, tooltip!.nuVText]).toEqual(['-0.999999996', '-1.0000000001']);
  });

  it('values close to ±1 keep their side; others read with 6 significant digits (common practice)', () => {
    const random = seededRandom(11);
    for (let k = 1; k <= 15; k++) {
      for (const sign of [1, -1]) {
        for (const towards of [1, -1]) {
          const nu = sign * (1 + towards * 10 ** -k * (1 + random()));
          for (const text of [formatStabilityIndex(nu), ...indexFields.map((field) => formatField(field, nu))]) {
            expect(side(Number(text)), `${nu} read as ${text}`).toBe(side(nu));
          }
        }
      }
    }
    expect(formatStabilityIndex(1)).toBe('1');
    expect(formatStabilityIndex(-1)).toBe('-1');
    expect(formatStabilityIndex(0.123456789)).toBe('0.123457');
    expect(formatStabilityIndex(-2.7)).toBe('-2.7');
    expect(formatStabilityIndex(123456789)).toBe('1.23457e+8');
  });
});
