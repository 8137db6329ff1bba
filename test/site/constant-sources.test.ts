// Each system preset names the published source of its constants (the text a catalog stores and the site
// shows); "from memory" is a note for test comments, never product text.
import { describe, expect, it } from 'vitest';
import { SYSTEM_PRESETS } from '../../generator/core/cr3bp/system-presets.ts';

describe('system presets: the source text the site shows', () => {
  it('names a published source for every preset and never says "from memory"', () => {
    for (const preset of SYSTEM_PRESETS) {
      expect(preset.source, preset.id).not.toMatch(/from memory/i);
      expect(preset.source, preset.id).toMatch(/JPL|IAU|WGS-84/);
    }
  });

  it('Earth–Moon names DE430 (Folkner et al. 2014), WGS-84 and the IAU mean lunar radius', () => {
    const earthMoon = SYSTEM_PRESETS.find((p) => p.id === 'earth-moon')!;
    for (const name of ['JPL DE430', 'Folkner et al. 2014', 'WGS-84', 'IAU mean lunar radius']) expect(earthMoon.source).toContain(name);
  });
});
