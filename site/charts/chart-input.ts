// What the family charts are drawn from: plain numbers per member, window and bifurcation.

export interface ChartMember {
  id: string;
  seq: number;
  /** The member's page; null for members of a long family without a page of their own (site/lib/paged-members.ts). */
  href: string | null;
  altKm: number; // minimum altitude above the smaller body
  nu: number; // in-plane stability index
  nuV: number; // vertical stability index
  jacobi: number;
  periodDays: number;
}

export interface ChartWindow {
  fromAltKm: number;
  toAltKm: number;
  fromJacobi: number;
  toJacobi: number;
}

export interface ChartBifurcation {
  kind: 'tangent' | 'period-doubling';
  plane: 'in-plane' | 'vertical';
  altKm: number;
  jacobi: number;
  periodDays: number;
}

export interface FamilyChartInput {
  secondaryName: string;
  members: ChartMember[];
  windows: ChartWindow[];
  bifurcations: ChartBifurcation[];
}
