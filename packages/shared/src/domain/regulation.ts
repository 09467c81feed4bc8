/**
 * Default regulation specifications: starting points a technician edits per piano, in millimetres,
 * each row labelled with where its figures come from (labels as in the project's trade notes).
 */

/** Piano types with their own regulation defaults. */
export type RegulatedPianoType = 'grand' | 'upright';

/** Regulation settings measured in millimetres. */
export type RegulationSetting =
  | 'keyDip'
  | 'blowDistance'
  | 'letOffTreble'
  | 'letOffBass'
  | 'letOff'
  | 'drop'
  | 'checkDistance'
  | 'sharpHeight';

/** One default: nominal value and accepted range, millimetres; `source` names the figures' origin. */
export interface RegulationSpec {
  setting: RegulationSetting | 'damperLift';
  pianoType: RegulatedPianoType;
  label: string;
  nominalMm: number;
  minMm: number;
  maxMm: number;
  source: string;
}

/** Result of comparing a measurement with a spec; differences in mm rounded to 0.01 mm. */
export interface MeasurementCheck {
  status: 'within' | 'low' | 'high';
  /** Measured − nominal. */
  differenceMm: number;
  /** Distance outside the nearer limit; 0 when within. */
  outsideByMm: number;
}

type Row = [RegulationSetting, string, number, number, number, string];

const GRAND: Row[] = [
  ['keyDip', 'Key dip (naturals)', 10, 9.5, 11, 'S10a, S10b'],
  ['blowDistance', 'Hammer blow distance', 47, 44, 48, 'S10a–c'],
  ['letOffTreble', 'Let-off, treble', 1.75, 1.5, 2, 'S10a, S10c, S10d'],
  ['letOffBass', 'Let-off, bass', 2.5, 2, 3, 'S10a, S10c, S10d; range ±0.5 mm: common practice'],
  ['drop', 'Drop below let-off', 1.5, 1, 2, 'S10e; common practice'],
  ['checkDistance', 'Check distance', 15.5, 15, 16, 'S10a; from memory'],
  ['sharpHeight', 'Sharp height above naturals', 12.35, 12, 12.7, 'S10g'],
];

const UPRIGHT: Row[] = [
  ['keyDip', 'Key dip (naturals)', 10.25, 10, 10.5, 'S10a, S10b'],
  ['blowDistance', 'Hammer blow distance', 45.5, 43, 48, 'S10a–c'],
  ['letOff', 'Let-off', 3, 1, 3, 'S10a, S10c, S10d'],
  ['checkDistance', 'Check distance', 15, 14, 16, 'S10a; from memory; range ±1 mm: common practice'],
  ['sharpHeight', 'Sharp height above naturals', 12.35, 12, 12.7, 'S10g'],
];

function toSpec(pianoType: RegulatedPianoType, [setting, label, nominalMm, minMm, maxMm, source]: Row): RegulationSpec {
  return { setting, pianoType, label, nominalMm, minMm, maxMm, source };
}

/** Default specs by piano type. Where a source gives only a range, the nominal is its midpoint. */
export const REGULATION_SPECS: Readonly<Record<RegulatedPianoType, readonly RegulationSpec[]>> = {
  grand: GRAND.map((row) => toSpec('grand', row)),
  upright: UPRIGHT.map((row) => toSpec('upright', row)),
};

/** The default spec for one setting, or undefined when the piano type has no such setting (drop on an upright). */
export function findRegulationSpec(pianoType: RegulatedPianoType, setting: RegulationSetting): RegulationSpec | undefined {
  return REGULATION_SPECS[pianoType].find((spec) => spec.setting === setting);
}

/**
 * Damper lift as hammer travel in mm from rest at which the damper starts to lift: about half the
 * blow distance (S10h), accepted from 40 % to 60 % of it (range: common practice).
 */
export function damperLiftSpec(pianoType: RegulatedPianoType, blowDistanceMm: number): RegulationSpec {
  const at = (fraction: number) => Math.round(blowDistanceMm * fraction * 100) / 100;
  return {
    setting: 'damperLift',
    pianoType,
    label: 'Damper lift begins (hammer travel)',
    nominalMm: at(0.5),
    minMm: at(0.4),
    maxMm: at(0.6),
    source: 'S10h; range 40–60 % of travel: common practice',
  };
}

const toHundredths = (mm: number) => Math.round(mm * 100) / 100;

/** Compares a measurement in mm with a spec: within [min, max] inclusive, else low or high. */
export function checkMeasurement(spec: RegulationSpec, valueMm: number): MeasurementCheck {
  const differenceMm = toHundredths(valueMm - spec.nominalMm);
  if (valueMm < spec.minMm) return { status: 'low', differenceMm, outsideByMm: toHundredths(spec.minMm - valueMm) };
  if (valueMm > spec.maxMm) return { status: 'high', differenceMm, outsideByMm: toHundredths(valueMm - spec.maxMm) };
  return { status: 'within', differenceMm, outsideByMm: 0 };
}

/** Usual order of grand regulation work (S10i). */
export const GRAND_REGULATION_ORDER: readonly string[] = [
  'Keyframe and balance rail',
  'Key height and level',
  'Hammer shanks',
  'Hammer line',
  'Let-off',
  'Touchweight',
  'Springs',
  'Drop and aftertouch',
  'Trapwork',
  'Dampers',
  'Damper timing',
  'Sostenuto',
];
