/** Public surface of the RF-exposure helpers. */
export { RF_EXPOSURE_CAUTION } from './caution.ts';
export { DEFAULT_EXPOSURE_DISTANCE_M, exposureEstimate, type ExposureEstimate, type ExposureInput } from './exposure-estimate.ts';
export {
  dbmToWatts,
  distanceToReferenceM,
  ICNIRP_2020_PUBLIC_WHOLE_BODY_WM2,
  powerDensityWm2,
  REFERENCE_LEVEL_SOURCE,
} from './power-density.ts';
