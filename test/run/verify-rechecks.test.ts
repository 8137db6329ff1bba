// verify re-integrates each orbit with its monodromy and trusts nothing stored: the closure limit scales
// with the re-integrated eigenvalues, and the stored Jacobi constant, period and indices must agree.
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Database from 'better-sqlite3';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { verifyCatalog } from '../../generator/run/verify-catalog.ts';
import { copyCatalog, generateTiny } from './hostile-inputs.fixture.ts';

const dir = mkdtempSync(join(tmpdir(), 'cycler-atlas-verify-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const base = join(dir, 'base.sqlite');
const orbitId = 'earth-moon/L1-Lyapunov/a/0003';

/** A copy of the base catalog with one orbit's columns set by SQL (a corrupted file). */
function tampered(name: string, set: string): string {
  const path = copyCatalog(base, join(dir, name));
  const db = new Database(path);
  expect(db.prepare(`UPDATE orbits SET ${set} WHERE id = ?`).run(orbitId).changes).toBe(1);
  db.close();
  return path;
}

describe('verify rechecks every stored value', () => {
  beforeAll(async () => {
    await generateTiny(base);
  });

  it('passes the untouched catalog', () => {
    expect(verifyCatalog(base).failures).toEqual([]);
  });

  it.each([
    ['eigenvalues 1e300 hide no shifted x0 (1e-3)',
      `eigenvalues = '[[1e300,0],[1e-300,0],[1,0],[1,0]]', state0 = json_set(state0, '$[0]', json_extract(state0, '$[0]') + 1e-3)`,
      /stored largest eigenvalue modulus 1e\+300 differs/],
    ['a stored Jacobi constant off by 1e-6', 'jacobi = jacobi + 1e-6', /stored Jacobi constant .* differs from its state's/],
    ['a negative period', 'period = -period', /period -\d\.\d+ is not a positive number/],
    ['a stability index of the wrong sign', 'stability_index = -stability_index', /stored stability index -\d+.* differs from the re-integrated/],
    ['a vertical index changed in its third digit', 'vertical_stability_index = vertical_stability_index * 1.01', /stored vertical index .* differs/],
    ['a period in days that does not match the period', 'period_days = period_days * 1.5', /stored period .* d differs from/],
  ])('fails %s, naming the orbit and what disagrees', (name, set, why) => {
    const report = verifyCatalog(tampered(`${name.replace(/\W+/g, '-')}.sqlite`, set));
    expect(report.failures.map((f) => f.orbitId)).toEqual([orbitId]);
    expect(report.failures[0]!.disagreements.join('; ')).toMatch(why);
  });

  it('scales the closure limit by the re-integrated eigenvalues, so a shifted state fails on closure too', () => {
    const report = verifyCatalog(tampered('shifted.sqlite', `eigenvalues = '[[1e300,0],[1e-300,0],[1,0],[1,0]]', state0 = json_set(state0, '$[0]', json_extract(state0, '$[0]') + 1e-3)`));
    const failure = report.failures[0]!;
    // λ ≈ 2ν (λ + 1/λ = 2ν, Hénon 1973) with ν of order 1e3 for small Earth–Moon L1 Lyapunov orbits (from memory).
    expect(failure.largestEigenvalueModulus).toBeLessThan(1e4);
    expect(failure.closureError).toBeGreaterThan(failure.limits.closure);
  });
});
