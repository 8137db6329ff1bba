// The glossary's terms other than codes: the quantities, indices and units the pages use, each with the
// anchor pages link to. Codes (end reasons, segments, kinds) come from term-labels.ts.

export interface GlossaryTerm {
  anchor: string;
  term: string;
  definition: string;
}

export const QUANTITY_TERMS: readonly GlossaryTerm[] = [
  { anchor: 'cr3bp', term: 'Circular restricted three-body problem (CR3BP)', definition: 'The model every orbit here is computed in: two bodies on circular orbits about their centre of mass, and a third of negligible mass moving under their gravity, seen in the frame that turns with the two bodies.' },
  { anchor: 'mu', term: 'μ (mass ratio)', definition: 'The smaller body’s share of the two masses, GM₂ / (GM₁ + GM₂). The larger body sits at x = −μ, the smaller at x = 1 − μ.' },
  { anchor: 'lu', term: 'LU (length unit)', definition: 'The distance between the two bodies; positions are given in this unit and in km.' },
  { anchor: 'tu', term: 'TU (time unit)', definition: 'The time in which the frame turns by one radian, √(LU³ / G(M₁ + M₂)); periods are given in TU and in days.' },
  { anchor: 'km', term: 'km, km/s', definition: 'Kilometres and kilometres per second: the nondimensional values scaled by LU and LU/TU.' },
  { anchor: 'days', term: 'd (days)', definition: 'Days of 86,400 seconds: periods, months and spans are given in them beside TU.' },
  { anchor: 'jacobi', term: 'C (Jacobi constant)', definition: 'The energy-like quantity conserved along an orbit in the rotating frame, C = x² + y² + 2(1 − μ)/r₁ + 2μ/r₂ − v². A larger C means less energy.' },
  { anchor: 'nu', term: 'ν (in-plane stability index)', definition: 'Half the sum of an in-plane eigenvalue λ of the orbit’s monodromy matrix and its inverse, (λ + 1/λ)/2. With |ν| < 1 the orbit is linearly stable in its plane.' },
  { anchor: 'nu-z', term: 'ν_z (vertical stability index)', definition: 'The same index for motion out of the plane. Where ν_z reaches +1 or −1, a family of spatial orbits branches off.' },
  { anchor: 'lap-signature', term: 'Lap signature', definition: 'Letters and counts such as E2M1: over one period, how many times the orbit crosses the x-axis on the far side of the larger body (first letter) and of the smaller body (second letter). E0M0 or E0M1 mark families, such as Lyapunov orbits, that make no such laps about one body or either.' },
  { anchor: 'stable-window', term: 'Stable window', definition: 'The longest unbroken stretch of a family whose members have |ν| < 1; its edges are located to 1e-6 in ν.' },
  { anchor: 'member', term: 'Member number (#)', definition: 'Members are numbered from #0 along their family; the number is the end of the orbit’s id.' },
  { anchor: 'altitude', term: 'Altitude', definition: 'The closest approach to a body’s surface over one period, in km above its radius.' },
  { anchor: 'arclength', term: 'Arclength', definition: 'How far along the family a member lies, measured in the start-state coordinates the continuation steps in.' },
  { anchor: 'synodic-lock', term: 'Synodic lock p:q', definition: 'The small-integer ratio nearest to the orbit’s period divided by the synodic month.' },
  { anchor: 'hold-radius', term: 'Hold radius', definition: 'The largest displacement along the crossing section, at the same C, whose returns stay on a closed curve for the set number of returns.' },
  { anchor: 'screening', term: 'Screening', definition: 'A check of a stable member in a richer model (the Sun’s pull in the bicircular model, the Moon’s eccentricity in the elliptic one): whether its lap signature holds, and when it breaks. Not a verification.' },
  { anchor: 'seeded-on', term: 'Seeded on', definition: 'The part of the x-axis where the search for periodic orbits first found the family.' },
  { anchor: 'job', term: 'Catalog job', definition: 'One search the catalog config asks for: a system and a lap signature (or a reference family). Each family is found by one job of one generator run.' },
  { anchor: 'run', term: 'Generator run', definition: 'One execution of the generator that wrote into the catalog; the home page lists each with its version and tolerances.' },
];
