// Families are followed through folds of C and end only for reasons of their own. One E1M1 job on a
// small discovery grid (far side of the Earth, ẏ < 0, four levels from C = 3.09 to 3.152) yields a
// family that turns back in C at C ≈ 3.1512 with narrow stable windows at the fold, and families that
// end at the Moon's surface, and that pass brake points of one of their two perpendicular crossings
// (followed on from the other crossing); an E1M2 family (SIGNATURE_CHANGE_JOB) ends at a change of signature.
// Checks: the members on both sides of a fold are periodic (mirror theorem, Roy & Ovenden 1955: ẋ = 0
// at T/2, checked with odex, an independent integrator on npm); a collision end's last member comes
// within one continuation step of the body's radius (IAU mean lunar radius 1737.4 km, from memory); a
// family passes a brake point of its start crossing, where ẏ0 falls toward 0 (the start reaches the
// zero-velocity curve, Szebehely 1967, ch. 4), by going on from its other crossing;
// a signature-change end's next member along the family (corrected one step further) has another signature.
import { beforeAll, describe, expect, it } from 'vitest';
import type { FamilyBundle, OrbitRow } from '../../catalog-db/types.ts';
import { lagrangePoints } from '../../generator/core/cr3bp/lagrange-points.ts';
import { analyseOrbit } from '../../generator/core/orbits/analyse-orbit.ts';
import { BRAKE_SPEED_ND } from '../../generator/core/orbits/continue-family.ts';
import { correctOnArc } from '../../generator/core/orbits/correct-on-arc.ts';
import { formatSignature } from '../../generator/core/cr3bp/lap-signature.ts';
import { storedOrbitFootprint } from '../../generator/core/orbits/audit-footprint.ts';
import { EARTH_MOON, FOLD_JOB, SIGNATURE_CHANGE_INPUTS, SIGNATURE_CHANGE_JOB, jobResult } from './helpers/earth-moon-jobs.ts';
import { odexFlow } from './helpers/odex-flow.ts';

const mu = EARTH_MOON.mu;
const xL1 = lagrangePoints(mu)[0]!.x;


const ends = (b: FamilyBundle) => [b.family.endReasonStart, b.family.endReasonEnd];

/** The member at the end that stopped for `reason`, and its neighbour inside the family. */
function endMembers(b: FamilyBundle, reason: string): [OrbitRow, OrbitRow] {
  const o = b.orbits;
  return b.family.endReasonEnd === reason ? [o[o.length - 1]!, o[o.length - 2]!] : [o[0]!, o[1]!];
}

describe('folds and natural ends (one small E1M1 job)', () => {
  let bundles: FamilyBundle[];
  beforeAll(() => {
    bundles = jobResult(FOLD_JOB).bundles;
  });

  it('continues a family through a fold of C: both sides are periodic orbits', () => {
    const folded = bundles.find((b) => {
      const c = b.orbits.map((o) => o.jacobi);
      return c.some((v, i) => i > 0 && i + 1 < c.length && (v - c[i - 1]!) * (c[i + 1]! - v) < 0);
    });
    expect(folded, bundles.map((b) => b.family.id).join(', ')).toBeDefined();
    const c = folded!.orbits.map((o) => o.jacobi);
    const top = c.indexOf(Math.max(...c));
    expect(top).toBeGreaterThan(0);
    expect(top).toBeLessThan(c.length - 1);
    for (const o of [folded!.orbits[top - 1]!, folded!.orbits[top + 1]!, folded!.orbits[Math.max(0, top - 20)]!, folded!.orbits[Math.min(c.length - 1, top + 20)]!]) {
      const half = odexFlow(mu, o.state0, o.period / 2, { tolerance: 1e-13 }).state;
      expect(Math.abs(half[1]!), `${o.id}: y at T/2`).toBeLessThan(1e-7);
      expect(Math.abs(half[3]!), `${o.id}: vx at T/2`).toBeLessThan(1e-6);
    }
  });

  it('ends at a collision only within one step of the body\'s surface', () => {
    const collided = bundles.filter((b) => ends(b).includes('collision-secondary'));
    expect(collided.length).toBeGreaterThan(0);
    for (const b of collided) {
      const [last, previous] = endMembers(b, 'collision-secondary');
      const stepKm = Math.abs(last.secondaryMinAltKm - previous.secondaryMinAltKm);
      expect(last.secondaryMinAltKm, b.family.id).toBeGreaterThanOrEqual(0);
      expect(last.secondaryMinAltKm, b.family.id).toBeLessThanOrEqual(Math.max(stepKm, 1));
    }
  });

  it('passes a brake point of one crossing by going on from the other, where ẏ0 falls toward zero', () => {
    // The switch: two neighbours that are one orbit (same C and period) stated from its two crossings.
    const switches = bundles.flatMap((b) => b.orbits.slice(1).flatMap((o, i) => {
      const p = b.orbits[i]!;
      const same = Math.abs(o.jacobi - p.jacobi) < 1e-9 && Math.abs(o.period - p.period) < 1e-7 && Math.abs(o.state0[0]! - p.state0[0]!) > 1e-3;
      return same ? [{ b, at: i }] : [];
    }));
    expect(switches.length).toBeGreaterThan(0);
    for (const { b, at } of switches) {
      const before = b.orbits.slice(Math.max(0, at - 3), at + 1).map((o) => Math.abs(o.state0[4]!));
      const reached = before[before.length - 1]!;
      // Either the start crossing had reached the zero-velocity curve, or the corrector had failed there.
      if (reached < 20 * BRAKE_SPEED_ND) expect(before.every((v, i) => i === 0 || v <= before[i - 1]!), `${b.family.id}: ${before.join(' ')}`).toBe(true);
      // The orbit goes on from the other crossing: the member after the switch is a periodic orbit.
      const next = b.orbits[Math.min(b.orbits.length - 1, at + 2)]!;
      const half = odexFlow(mu, next.state0, next.period / 2, { tolerance: 1e-13 }).state;
      expect(Math.abs(half[3]!), `${next.id}: vx at T/2`).toBeLessThan(1e-6);
    }
    // A brake-orbit end: at its last member one of the two crossings (t = 0 or T/2) has ẏ near zero.
    for (const b of bundles.filter((f) => ends(f).includes('brake-orbit'))) {
      const last = endMembers(b, 'brake-orbit')[0];
      const vyHalf = odexFlow(mu, last.state0, last.period / 2, { tolerance: 1e-13 }).state[4]!;
      expect(Math.min(Math.abs(last.state0[4]!), Math.abs(vyHalf)), b.family.id).toBeLessThan(20 * BRAKE_SPEED_ND);
    }
  });

  it('ends at a signature change where the next member along the family has another signature', () => {
    const changed = jobResult(SIGNATURE_CHANGE_JOB, SIGNATURE_CHANGE_INPUTS).bundles.filter((b) => ends(b).includes('signature-change'));
    expect(changed.length).toBeGreaterThan(0);
    const corrector = { rtol: 1e-12, atol: 1e-12, maxTimeNd: 40, residualTolerance: 2e-11, maxIterations: 12 };
    for (const b of changed) {
      const [last] = endMembers(b, 'signature-change');
      // The members close in on the end in steps down to 1e-12: the direction is taken from the first
      // member at least 1e-5 away, and the next member is sought up to 1e-3 beyond the end.
      const inward = b.family.endReasonEnd === 'signature-change' ? [...b.orbits].reverse() : b.orbits;
      const previous = inward.find((o) => Math.hypot(o.state0[0]! - last.state0[0]!, o.state0[4]! - last.state0[4]!) > 1e-5)!;
      const dx = last.state0[0]! - previous.state0[0]!, dv = last.state0[4]! - previous.state0[4]!;
      const unit = 1 / Math.hypot(dx, dv);
      // Along the secant beyond the end member, 1e-3 and less.
      const signatures = [1, 0.5, 0.25].flatMap((f) => {
        const { halfCrossings } = storedOrbitFootprint(mu, last.state0, last.period, { rtol: 1e-12, atol: 1e-12 });
        const next = correctOnArc(mu, halfCrossings, [last.state0[0]!, last.state0[4]!], [dx * unit, dv * unit], f * 1e-3, corrector);
        if (!next) return [];
        const a = analyseOrbit({ mu, xL1, rtol: 1e-12, atol: 1e-12 }, next.x0, next.vy0, 2 * next.shot.tHalfNd);
        return [formatSignature('E', 'M', a.laps) + (a.l1Passages === 0 ? '/no-L1' : '')];
      });
      expect(signatures.length, b.family.id).toBeGreaterThan(0);
      expect(signatures.some((s) => s !== b.family.signature), `${b.family.id}: ${signatures.join(' ')}`).toBe(true);
    }
  });
});
