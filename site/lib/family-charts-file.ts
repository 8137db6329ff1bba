// The family page's chart file (data/family-charts/<family>/specs.json): the Vega-Lite spec of each chart by
// key, and each stable window's zoom span on the two x axes the charts use. Types only (the browser reads it).

export interface ZoomWindow {
  label: string;
  altKm: [number, number];
  jacobi: [number, number];
}

export interface FamilyChartsFile {
  specs: Record<string, Record<string, unknown>>;
  windows: ZoomWindow[];
}
