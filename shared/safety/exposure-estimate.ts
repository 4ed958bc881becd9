/** One RF-exposure estimate as the UI and the review packet show it: density at a distance, distance to a level. */
import { dbmToWatts, distanceToReferenceM, ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2, powerDensityWm2 } from './power-density.ts';

/** Distance shown before the user sets one (m). */
export const DEFAULT_EXPOSURE_DISTANCE_M = 1;

export interface ExposureInput {
  eirpDbm: number;
  /** Distance from the aperture (m); default DEFAULT_EXPOSURE_DISTANCE_M. */
  distanceM?: number;
  /** Reference level (W/m²); default the ICNIRP 2020 general-public level above 2 GHz. */
  referenceWm2?: number;
}

export interface ExposureEstimate {
  eirpDbm: number;
  eirpW: number;
  distanceM: number;
  referenceWm2: number;
  densityWm2: number;
  distanceToReferenceM: number;
  /** True when the estimate at distanceM is above the reference level. */
  aboveReference: boolean;
}

export function exposureEstimate(input: ExposureInput): ExposureEstimate {
  const distanceM = input.distanceM ?? DEFAULT_EXPOSURE_DISTANCE_M;
  const referenceWm2 = input.referenceWm2 ?? ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2;
  const densityWm2 = powerDensityWm2(input.eirpDbm, distanceM);
  return {
    eirpDbm: input.eirpDbm,
    eirpW: dbmToWatts(input.eirpDbm),
    distanceM,
    referenceWm2,
    densityWm2,
    distanceToReferenceM: distanceToReferenceM(input.eirpDbm, referenceWm2),
    aboveReference: densityWm2 > referenceWm2,
  };
}
