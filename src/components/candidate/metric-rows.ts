/** The metrics table of the preview: label, value with its unit, in the order a designer reads them. */
import type { Metrics } from '@shared/engine/index.ts';

export interface MetricRow {
  key: string;
  label: string;
  value: string;
}

const f = (v: number | null, digits = 1, unit = '') => (v === null || !Number.isFinite(v) ? '—' : `${v.toFixed(digits)}${unit}`);

export function metricRows(m: Metrics): MetricRow[] {
  return [
    { key: 'peak', label: 'Peak direction (az, el)', value: `${f(m.peakAzDeg, 1, '°')}, ${f(m.peakElDeg, 1, '°')}` },
    { key: 'pointingErrorDeg', label: 'Pointing error', value: f(m.pointingErrorDeg, 2, '°') },
    { key: 'hpbwAzDeg', label: 'HPBW az', value: `${f(m.hpbwAzDeg, 1, '°')}${m.hpbwAzClipped ? ' (cut short by the horizon)' : ''}` },
    { key: 'hpbwElDeg', label: 'HPBW el', value: `${f(m.hpbwElDeg, 1, '°')}${m.hpbwElClipped ? ' (cut short by the horizon)' : ''}` },
    { key: 'sllAzDb', label: 'Side-lobe level az', value: f(m.sllAzDb, 1, ' dB') },
    { key: 'sllElDb', label: 'Side-lobe level el', value: f(m.sllElDb, 1, ' dB') },
    // Gain is what a link budget counts (embedded element gain plus array gain); directivity is the pattern's own.
    { key: 'gainDbi', label: 'Gain (at the peak)', value: f(m.gainDbi, 2, ' dBi') },
    { key: 'gainAtSteerDbi', label: 'Gain toward the steer', value: f(m.gainAtSteerDbi, 2, ' dBi') },
    { key: 'elementGainDbi', label: 'Element gain', value: f(m.elementGainDbi, 2, ' dBi') },
    { key: 'pointingLossDb', label: 'Pointing loss (peak − toward steer)', value: f(m.pointingLossDb, 2, ' dB') },
    { key: 'scanLossDb', label: 'Scan loss (gain below broadside)', value: f(m.scanLossDb, 2, ' dB') },
    { key: 'directivityDbi', label: "Directivity (the pattern's)", value: f(m.directivityDbi, 2, ' dBi') },
    { key: 'taperEfficiencyDb', label: 'Taper efficiency', value: f(m.taperEfficiencyDb, 2, ' dB') },
    { key: 'gratingLobeOnset', label: 'Grating-lobe onset (az, el)', value: `${f(m.gratingLobeOnsetAzDeg, 1, '°')}, ${f(m.gratingLobeOnsetElDeg, 1, '°')}` },
    { key: 'gratingLobeVisible', label: 'Grating lobe visible', value: m.gratingLobeVisible ? 'yes' : 'no' },
    { key: 'channels', label: 'Channels', value: String(m.channels) },
    { key: 'aperture', label: 'Aperture (x × y)', value: `${f(m.apertureXMm, 2)} × ${f(m.apertureYMm, 2)} mm` },
    { key: 'conductedPowerDbm', label: 'Conducted power', value: f(m.conductedPowerDbm, 1, ' dBm') },
    { key: 'eirpDbm', label: 'EIRP (at the peak)', value: f(m.eirpDbm, 1, ' dBm') },
    { key: 'eirpAtSteerDbm', label: 'EIRP toward the steer', value: f(m.eirpAtSteerDbm, 1, ' dBm') },
    // The codes themselves have their own table (ChannelCodesTable): 64 of them do not fit a cell.
    { key: 'phase', label: 'Phase control', value: m.codes ? `${m.codes.length} codes (listed below)` : 'continuous phase' },
  ];
}
