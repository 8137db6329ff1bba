// The frames and units a state export can be written in, with the CCSDS names the OEM gives them.
// EME2000 is the one real, dated frame; the other three are CR3BP model frames named by us.
import type { ExportOrbit } from './export-orbit.ts';

export const STATE_FRAMES = ['rotating', 'inertial-primary', 'inertial-secondary', 'eme2000'] as const;
export type StateFrame = (typeof STATE_FRAMES)[number];

export const STATE_UNITS = ['km', 'nd'] as const;
/** km: km, km/s; nd: the model's length unit (LU) and LU per time unit (TU). */
export type StateUnits = (typeof STATE_UNITS)[number];

export interface FrameNames {
  /** CCSDS REF_FRAME and CENTER_NAME. */
  refFrame: string;
  centerName: string;
  /** In words, for comments and the page. */
  label: string;
}

export function frameNames(orbit: ExportOrbit, frame: StateFrame): FrameNames {
  const p = orbit.primaryName, s = orbit.secondaryName;
  if (frame === 'eme2000') {
    return { refFrame: 'EME2000', centerName: 'EARTH', label: 'Earth-centred inertial, EME2000 (J2000 mean equator and equinox)' };
  }
  if (frame === 'rotating') {
    return { refFrame: 'CR3BP_ROTATING', centerName: `${p}-${s} barycenter`.toUpperCase(), label: `CR3BP rotating frame (barycentric, x from ${p} to ${s})` };
  }
  const body = frame === 'inertial-primary' ? p : s;
  return { refFrame: 'CR3BP_INERTIAL', centerName: body.toUpperCase(), label: `CR3BP inertial axes centred on ${body} (the rotating axes at t = 0)` };
}
