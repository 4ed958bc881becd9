/**
 * Taylor n-bar line-source distribution sampled at N element centres, centre value 1.
 * Taylor, "Design of line-source antennas for narrow beamwidth and low side lobes",
 * IRE Trans. AP-3 (1955); coefficients F_m as in Carrara, Goodman & Majewski, Spotlight SAR (1995), App. D.
 */
export function taylor(n: number, nbar: number, sllDb: number): Float64Array {
  if (!Number.isInteger(n) || n < 1) throw new RangeError('invalid n');
  if (!Number.isInteger(nbar) || nbar < 1) throw new RangeError('invalid nbar');
  if (!(sllDb > 0)) throw new RangeError('invalid sllDb');
  const w = new Float64Array(n);
  if (n === 1) return w.fill(1);
  const r = 10 ** (sllDb / 20);
  const a = Math.acosh(r) / Math.PI;
  const a2 = a * a;
  // Dilation σ² that joins the ideal (Dolph) zeros to the uniform zeros at n-bar.
  const sigma2 = (nbar * nbar) / (a2 + (nbar - 0.5) ** 2);
  const fm = new Float64Array(nbar);
  for (let m = 1; m < nbar; m++) {
    let num = 1;
    let den = 1;
    for (let i = 1; i < nbar; i++) {
      num *= 1 - (m * m) / (sigma2 * (a2 + (i - 0.5) ** 2));
      if (i !== m) den *= 1 - (m * m) / (i * i);
    }
    fm[m] = ((m % 2 === 1 ? 1 : -1) * num) / (2 * den);
  }
  const sample = (pos: number): number => {
    let s = 1;
    for (let m = 1; m < nbar; m++) s += 2 * fm[m]! * Math.cos(2 * Math.PI * m * pos);
    return s;
  };
  // Element m sits at (m - (N-1)/2)/N of the aperture length.
  const centre = sample(0);
  for (let m = 0; m < n; m++) w[m] = sample((m - (n - 1) / 2) / n) / centre;
  return w;
}
