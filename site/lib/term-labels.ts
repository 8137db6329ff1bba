// The one table of the catalog's internal codes (end reasons, start segments, family kinds) in plain words:
// the label a page shows and the definition the glossary gives. Pages never print a code itself; a code
// not in the table (free text a catalog stored, e.g. "single orbit") is shown as stored.

export type TermGroup = 'end-reason' | 'segment' | 'kind';

export interface CodeTerm {
  code: string;
  label: string;
  definition: string;
}

export const END_REASON_TERMS: readonly CodeTerm[] = [
  { code: 'member-limit', label: 'member limit reached', definition: 'The family reached the largest number of members a job may store (5000 unless the config says otherwise). This is a safety valve: the family may well go on.' },
  { code: 'jacobi-range', label: 'left the C range', definition: 'The Jacobi constant C left the range the catalog config asks for.' },
  { code: 'period-limit', label: 'period limit reached', definition: 'The period grew past the longest period the catalog config allows.' },
  { code: 'collision-primary', label: 'collision with the larger body', definition: 'The orbit came down to the surface of the larger body (its radius as the system lists it).' },
  { code: 'collision-secondary', label: 'collision with the smaller body', definition: 'The orbit came down to the surface of the smaller body (its radius as the system lists it).' },
  { code: 'brake-orbit', label: 'reached the zero-velocity curve', definition: 'At one of its perpendicular crossings the orbit reached the zero-velocity curve (its speed drops to zero there, a brake orbit), and the family could not be followed further from either crossing.' },
  { code: 'signature-change', label: 'lap signature changed', definition: 'The orbit began to make a different number of laps about one of the bodies, so it no longer belongs to this family.' },
  { code: 'lost-l1-passage', label: 'no longer passes L1', definition: 'The orbit stopped crossing the neck at the L1 point between the bodies.' },
  { code: 'precision-limit', label: 'beyond double precision', definition: 'A stability index passed 5e9 in size, or, with an index above 5e7, the orbit stated from its two perpendicular crossings gave different stability indices; past that, round-off in double precision is larger than what defines the orbit.' },
  { code: 'no-convergence', label: 'corrector did not converge', definition: 'Newton’s method could not close the next orbit from either perpendicular crossing.' },
  { code: 'closed-loop', label: 'family closes on itself', definition: 'Continuation came back to an orbit it had already stored, moving the same way: the family is a closed curve of orbits (in start position and speed), and every member of it is stored once round.' },
  { code: 'joins-family', label: 'meets another catalogued family', definition: 'Continuation ran onto the orbits of a family already in the catalog, which had ended on its own side before reaching this part: the two are parts of one family, and the orbits they share are stored once, in the other family.' },
  { code: 'unstable-far-from-windows', label: 'very unstable, far from stable stretches', definition: 'The catalog config asked to stop where a family becomes violently unstable far from any stable window.' },
  { code: 'interrupted', label: 'run interrupted', definition: 'The generator run stopped before this family ended; running it again goes on from here.' },
];

export const SEGMENT_TERMS: readonly CodeTerm[] = [
  { code: 'far-primary', label: 'the x-axis beyond the larger body', definition: 'The part of the x-axis on the far side of the larger body from the smaller one.' },
  { code: 'between', label: 'the x-axis between the bodies', definition: 'The part of the x-axis between the two bodies.' },
  { code: 'far-secondary', label: 'the x-axis beyond the smaller body', definition: 'The part of the x-axis on the far side of the smaller body from the larger one.' },
];

export const KIND_TERMS: readonly CodeTerm[] = [
  { code: 'cycler', label: 'cycler', definition: 'An orbit that loops about one body, passes through the L1 neck, loops about the other and comes back, period after period.' },
  { code: 'lyapunov-l1', label: 'planar Lyapunov orbits about L1', definition: 'Planar orbits that circle the L1 point; kept for context.' },
  { code: 'lyapunov-l2', label: 'planar Lyapunov orbits about L2', definition: 'Planar orbits that circle the L2 point, beyond the smaller body; kept for context.' },
  { code: 'retrograde', label: 'retrograde orbits about the smaller body', definition: 'Orbits that circle the smaller body against the turn of the rotating frame.' },
  { code: 'other', label: 'other periodic orbits', definition: 'Periodic orbits of none of the kinds above.' },
];

export const TERM_GROUPS: Readonly<Record<TermGroup, readonly CodeTerm[]>> = {
  'end-reason': END_REASON_TERMS,
  segment: SEGMENT_TERMS,
  kind: KIND_TERMS,
};

/** The glossary anchor of a code (ids only, never shown). */
export function termAnchor(group: TermGroup, code: string): string {
  return `${group}-${code}`;
}

export function findTerm(group: TermGroup, code: string): CodeTerm | undefined {
  return TERM_GROUPS[group].find((t) => t.code === code);
}

/** What a page shows for a code: its label, or the stored text itself when it is no code of the table. */
export function termLabel(group: TermGroup, code: string): string {
  return findTerm(group, code)?.label ?? code;
}
