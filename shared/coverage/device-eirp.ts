import type { ResolvedModule } from '../schemas/coverage.ts';
import { elementPower, gainModel } from '../engine/index.ts';
import type { ElementPower } from '../engine/element/element-power.ts';
import { deviceDirection } from './device-direction.ts';
import { moduleAngles, type ModuleAngles } from './module-angles.ts';
import { moduleFrame, type ModuleFrame } from './module-frame.ts';

/** Which module and beam (indices into the request) serve a direction; -1 where nothing radiates. */
export interface Serving {
  module: number;
  beam: number;
}

export interface PlacedModule {
  frame: ModuleFrame;
  conductedPowerDbm: number;
  /** Linear power gain of each beam of the codebook at module-frame (az, el) in radians. */
  beams: ((azRad: number, elRad: number) => number)[];
  /** The element pattern: where it is 0 every beam's gain is 0 (G = G_e·|AF|²/Σa²), so the beams are skipped. */
  element: ElementPower;
}

export interface DeviceEirp {
  modules: PlacedModule[];
  /** EIRP in mW toward device-frame (az, el) in radians: the best beam of any module; fills `serving`. */
  at(azRad: number, elRad: number, serving: Serving): number;
}

/**
 * EIRP(d) = max over modules and beams of conductedPowerDbm + G_beam(d in the module frame), in linear
 * terms (mW). One gain model per beam: the module's design steered to the beam, phases quantised by the engine.
 */
export function deviceEirp(modules: readonly ResolvedModule[]): DeviceEirp {
  const placed: PlacedModule[] = modules.map((m) => {
    const beams = m.beams.map((b) => gainModel({ ...m.design, steerAzDeg: b.azDeg, steerElDeg: b.elDeg, codes: null }));
    const power = beams[0]?.conductedPowerDbm;
    if (power === null || power === undefined) throw new RangeError('module without channel power');
    return { frame: moduleFrame(m.orientation), conductedPowerDbm: power, beams: beams.map((g) => g.gainAt), element: elementPower(m.design.element) };
  });
  const powerMw = placed.map((p) => 10 ** (p.conductedPowerDbm / 10));
  const angles: ModuleAngles = { azRad: 0, elRad: 0 };
  const at = (azRad: number, elRad: number, serving: Serving): number => {
    const d = deviceDirection(azRad, elRad);
    let best = 0;
    serving.module = -1;
    serving.beam = -1;
    for (let i = 0; i < placed.length; i++) {
      const p = placed[i]!;
      moduleAngles(p.frame, d, angles);
      if (p.element(angles.azRad, angles.elRad) === 0) continue;
      const mw = powerMw[i]!;
      for (let k = 0; k < p.beams.length; k++) {
        const e = mw * p.beams[k]!(angles.azRad, angles.elRad);
        if (e > best) {
          best = e;
          serving.module = i;
          serving.beam = k;
        }
      }
    }
    return best;
  };
  return { modules: placed, at };
}
