/** The one wording of the RF-exposure caution, shared by the app and the review packet so both say the same. */
export const RF_EXPOSURE_CAUTION =
  'This is a far-field estimate, not a compliance assessment. ' +
  'Near-field and body-worn use need measurement or simulation. ' +
  'Local regulations and qualified RF-safety practice govern.';
