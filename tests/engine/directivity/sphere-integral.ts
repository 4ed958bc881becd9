/**
 * A slow, independent sphere integral for the directivity tests: the midpoint rule in (az, el) with
 * dΩ = cos(el)·d(el)·d(az), az over [−π, π], el over [−π/2, π/2]. No closed forms, nothing from the engine.
 */
export function sphereIntegral(f: (azRad: number, elRad: number) => number, nAz = 1440, nEl = 720): number {
  const dAz = (2 * Math.PI) / nAz;
  const dEl = Math.PI / nEl;
  let total = 0;
  for (let j = 0; j < nEl; j++) {
    const el = -Math.PI / 2 + (j + 0.5) * dEl;
    const ce = Math.cos(el);
    let row = 0;
    for (let i = 0; i < nAz; i++) row += f(-Math.PI + (i + 0.5) * dAz, el);
    total += row * ce;
  }
  return total * dAz * dEl;
}

/** The pair kernel's definition, ∮ E·cos(a·kdx·u + b·kdy·v) dΩ (E even in az and el), integrated directly. */
export function pairKernelByIntegral(element: (azRad: number, elRad: number) => number, kdxA: number, kdyB: number): number {
  return sphereIntegral((az, el) => element(az, el) * Math.cos(kdxA * Math.sin(az) * Math.cos(el) + kdyB * Math.sin(el)));
}
