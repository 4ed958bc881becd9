import type { Design } from '../../schemas/design.ts';
import { channelAmplitudes } from './channel-amplitudes.ts';

/**
 * Power fed into the array, dBm: channelPowerDbm (one channel at full amplitude) + 10·log10(Σ a_ch²) over the
 * channels' peak-normalised (quantised) amplitudes; a tapered channel delivers less. Null without channel power.
 */
export function conductedPowerDbm(design: Design): number | null {
  if (design.channelPowerDbm === null) return null;
  const a = channelAmplitudes(design);
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * a[i]!;
  return design.channelPowerDbm + 10 * Math.log10(s);
}
