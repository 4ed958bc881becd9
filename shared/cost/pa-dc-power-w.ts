/**
 * DC power the power amplifiers draw while transmitting: every channel's conducted power over the PA efficiency,
 * P_dc = Σ a_ch²·P_ch / η. With one efficiency for every PA the sum is the design's total conducted power
 * (channel power + 10·log10 Σ a_ch², the engine's conductedPowerDbm) over η, so that figure is what it takes.
 */
export function paDcPowerW(conductedPowerDbm: number, paEfficiency: number): number {
  if (!Number.isFinite(conductedPowerDbm)) throw new RangeError('invalid conductedPowerDbm');
  if (!(paEfficiency > 0 && paEfficiency <= 1)) throw new RangeError('invalid paEfficiency');
  return dbmToW(conductedPowerDbm) / paEfficiency;
}

/** 0 dBm = 1 mW. */
export function dbmToW(dbm: number): number {
  return 10 ** (dbm / 10) / 1000;
}
