import { RF_EXPOSURE_CAUTION } from '../safety/index.ts';

/** What the coverage model leaves out; shown with every coverage result (app, API, CLI) in these words. */
export const COVERAGE_MODEL_CAUTION =
  'Coverage is computed from the modules\' free-space beams alone: it ignores the hand, the head and the ' +
  'device\'s own housing. A self-blocking model such as 3GPP TR 38.901 §7.6.4.1 could follow; a compliance ' +
  'test measures the real device.';

/** The cautions every coverage result carries: the model's limits and the RF-exposure wording of shared/safety. */
export const COVERAGE_CAUTIONS: readonly string[] = [COVERAGE_MODEL_CAUTION, RF_EXPOSURE_CAUTION];
