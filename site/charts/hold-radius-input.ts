// What the family's hold-radius chart is drawn from: each screened member's hold radius with the stable
// window it lies in, plus the family's members and windows for the shared altitude axis.
import type { FamilyChartInput } from './chart-input.ts';

export interface HoldRadiusPoint {
  id: string;
  seq: number;
  href: string;
  altKm: number; // minimum altitude above the smaller body
  jacobi: number;
  holdKm: number;
  /** 0-based index of the stable window holding the member (by arclength), or null for none. */
  window: number | null;
  sunFraction: number | null; // surviving fraction in the bicircular screening
  eccFraction: number | null; // ... in the elliptic screening
}

export interface HoldRadiusChartInput {
  family: FamilyChartInput;
  points: HoldRadiusPoint[];
}
