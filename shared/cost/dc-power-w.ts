/**
 * Average DC draw of one module (W): the PAs draw only while transmitting (txDutyCycle of the time); the
 * per-channel overhead (phase shifter, LNA, bias) and the per-chip overhead (control, references) draw all the time.
 */
export interface DcPowerInput {
  paDcPowerW: number;
  channels: number;
  chips: number;
  channelOverheadW: number;
  chipOverheadW: number;
  txDutyCycle: number;
}

export function dcPowerW(p: DcPowerInput): number {
  if (!(p.txDutyCycle >= 0 && p.txDutyCycle <= 1)) throw new RangeError('invalid txDutyCycle');
  return p.txDutyCycle * p.paDcPowerW + p.channels * p.channelOverheadW + p.chips * p.chipOverheadW;
}
