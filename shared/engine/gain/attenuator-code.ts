/**
 * Attenuator setting for one peak-normalised amplitude a (0..1): code = round(-20·log10(a)/step), clipped to
 * 0..2^bits - 1 (a = 0 asks for more attenuation than any code gives, so it takes the last one).
 */
export function attenuatorCode(amplitude: number, stepDb: number, bits: number): number {
  if (!(stepDb > 0) || !Number.isInteger(bits) || bits < 1) throw new RangeError('invalid attenuator');
  const top = 2 ** bits - 1;
  if (!(amplitude > 0)) return top;
  const code = Math.round(-20 * Math.log10(amplitude) / stepDb);
  return code <= 0 ? 0 : code > top ? top : code;
}

/** The amplitude an attenuator code leaves: 10^(-code·step/20). */
export function attenuatedAmplitude(code: number, stepDb: number): number {
  return 10 ** ((-code * stepDb) / 20);
}
