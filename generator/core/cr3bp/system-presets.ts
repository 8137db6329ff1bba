// Primary pairs the tool knows by name. μ and the time unit follow from the two GM values:
// μ = GM₂ / (GM₁ + GM₂), TU = √(LU³ / (GM₁ + GM₂)).

export interface SystemPreset {
  id: string;
  name: string;
  primaryName: string;
  secondaryName: string;
  primaryLetter: string;
  secondaryLetter: string;
  primaryGmKm3S2: number;
  secondaryGmKm3S2: number;
  lengthUnitKm: number;
  primaryRadiusKm: number;
  secondaryRadiusKm: number;
  /** Period of the secondary's phases as seen from the Sun, where that applies. */
  synodicPeriodDays: number | null;
  source: string;
}

export const SYSTEM_PRESETS: readonly SystemPreset[] = [
  {
    id: 'earth-moon', name: 'Earth–Moon', primaryName: 'Earth', secondaryName: 'Moon',
    primaryLetter: 'E', secondaryLetter: 'M',
    primaryGmKm3S2: 398600.435436, secondaryGmKm3S2: 4902.800066, lengthUnitKm: 384400,
    primaryRadiusKm: 6378.137, secondaryRadiusKm: 1737.4, synodicPeriodDays: 29.530589,
    source: 'GM: JPL DE430 planetary constants (Folkner et al. 2014); LU: the conventional mean Earth–Moon distance; radii: WGS-84 equatorial radius and IAU mean lunar radius; synodic month: mean synodic month of the Astronomical Almanac',
  },
  {
    id: 'sun-earth', name: 'Sun–(Earth+Moon)', primaryName: 'Sun', secondaryName: 'Earth',
    primaryLetter: 'S', secondaryLetter: 'E',
    primaryGmKm3S2: 132712440018, secondaryGmKm3S2: 403503.235502, lengthUnitKm: 149597870.7,
    primaryRadiusKm: 695700, secondaryRadiusKm: 6378.137, synodicPeriodDays: null,
    source: 'GM: JPL DE430 planetary constants (Folkner et al. 2014); LU: IAU 2012 astronomical unit; radii: IAU 2015 nominal solar radius and WGS-84 equatorial radius',
  },
  {
    id: 'jupiter-europa', name: 'Jupiter–Europa', primaryName: 'Jupiter', secondaryName: 'Europa',
    primaryLetter: 'J', secondaryLetter: 'U',
    primaryGmKm3S2: 126686534, secondaryGmKm3S2: 3202.7, lengthUnitKm: 671100,
    primaryRadiusKm: 71492, secondaryRadiusKm: 1560.8, synodicPeriodDays: null,
    source: 'GM, mean distance and radii: JPL Solar System Dynamics planetary and satellite physical parameters',
  },
  {
    id: 'saturn-titan', name: 'Saturn–Titan', primaryName: 'Saturn', secondaryName: 'Titan',
    primaryLetter: 'S', secondaryLetter: 'T',
    primaryGmKm3S2: 37931207.7, secondaryGmKm3S2: 8978.14, lengthUnitKm: 1221870,
    primaryRadiusKm: 60268, secondaryRadiusKm: 2574.7, synodicPeriodDays: null,
    source: 'GM, mean distance and radii: JPL Solar System Dynamics planetary and satellite physical parameters',
  },
  {
    id: 'pluto-charon', name: 'Pluto–Charon', primaryName: 'Pluto', secondaryName: 'Charon',
    primaryLetter: 'P', secondaryLetter: 'C',
    primaryGmKm3S2: 869.6, secondaryGmKm3S2: 105.88, lengthUnitKm: 19596,
    primaryRadiusKm: 1188.3, secondaryRadiusKm: 606, synodicPeriodDays: null,
    source: 'GM, separation and radii: New Horizons results as tabulated in the JPL Solar System Dynamics satellite physical parameters',
  },
];

export function massRatioOf(preset: SystemPreset): number {
  return preset.secondaryGmKm3S2 / (preset.primaryGmKm3S2 + preset.secondaryGmKm3S2);
}

export function timeUnitSecondsOf(preset: SystemPreset): number {
  return Math.sqrt(preset.lengthUnitKm ** 3 / (preset.primaryGmKm3S2 + preset.secondaryGmKm3S2));
}

export function findSystemPreset(id: string): SystemPreset {
  const preset = SYSTEM_PRESETS.find((p) => p.id === id);
  if (!preset) {
    throw new RangeError(`system must be one of ${SYSTEM_PRESETS.map((p) => p.id).join(', ')}, got "${id}"`);
  }
  return preset;
}
