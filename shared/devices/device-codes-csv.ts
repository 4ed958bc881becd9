/**
 * Bench export of a device: the phase codes of every beam of every module's codebook, one row per module and beam
 * (module, face, candidate, beam number, steer, then one code per channel; modules with fewer channels leave the
 * later code cells empty). Codes follow the engine's rule (shared/bench/beam-codes.ts), uncalibrated.
 */
import { beamCodes } from '../bench/beam-codes.ts';
import { safeText } from '../export/safe-cell.ts';
import type { Beam } from '../schemas/coverage.ts';
import type { Design } from '../schemas/design.ts';

export interface CodedModule {
  label: string;
  face: string;
  candidate: string;
  design: Design;
  beams: readonly Beam[];
}

const csvText = (s: string) => {
  const t = safeText(s);
  return /[",\r\n]/.test(t) ? `"${t.replace(/"/g, '""')}"` : t;
};

export function deviceCodesCsv(deviceName: string, modules: readonly CodedModule[]): string {
  const rows = modules.flatMap((m, i) =>
    m.beams.map((b, j) => ({ m, beam: j + 1, b, codes: beamCodes(m.design, { azDeg: b.azDeg, elDeg: b.elDeg }, undefined, `modules[${i}].beams[${j}]`) })),
  );
  const channels = Math.max(0, ...rows.map((r) => r.codes.length));
  const header = ['module', 'face', 'candidate', 'beam', 'azDeg', 'elDeg', ...Array.from({ length: channels }, (_, c) => `ch${c + 1}`)];
  const lines = [
    `# device: ${safeText(deviceName).replace(/[\r\n,]+/g, ' ')}`,
    '# phase codes per channel for every beam of every module (uncalibrated); steer in each module\'s own frame (degrees)',
    header.join(','),
    ...rows.map((r) =>
      [csvText(r.m.label), r.m.face, csvText(r.m.candidate), r.beam, r.b.azDeg, r.b.elDeg, ...Array.from({ length: channels }, (_, c) => r.codes[c] ?? '')].join(','),
    ),
  ];
  return `${lines.join('\r\n')}\r\n`;
}
