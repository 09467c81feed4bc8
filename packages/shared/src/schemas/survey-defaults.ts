import type { Caution, SurveyPianoType, SurveyTemplateItem } from './surveys';

/*
 * Keybed's default survey templates, used until a workshop saves its own. The areas follow what a
 * technician inspects on a restoration assessment (TRADE.md §5 [S12a–c]): case, keys, action,
 * dampers, soundboard and bridges, pinblock, strings, plate, tuning, regulation, woodworm.
 */

type Item = Pick<SurveyTemplateItem, 'key' | 'area' | 'name'> & Partial<Pick<SurveyTemplateItem, 'hint' | 'measure'>>;

const CASE: Item[] = [
  { key: 'case-finish', area: 'Case', name: 'Case and finish', hint: 'Crazing, chips, fading, loose veneer, water or smoke marks' },
  { key: 'music-desk', area: 'Case', name: 'Music desk', hint: 'Hinges, supports, fretwork' },
  { key: 'lid-hinges', area: 'Case', name: 'Lid and hinges', hint: 'Hinge pins, prop stick, fall board' },
];

const KEYS: Item[] = [
  { key: 'keytops', area: 'Keys', name: 'Keytops', hint: 'Ivory or plastic; chips, missing or lifting tops' },
  { key: 'key-bushings', area: 'Keys', name: 'Keys and key bushings', hint: 'Loose or moth-eaten bushings, sticking keys' },
  { key: 'key-frame', area: 'Keys', name: 'Key frame', hint: 'Balance-rail and front-rail felts, bedding' },
];

const ACTION: Item[] = [
  { key: 'hammers', area: 'Action', name: 'Hammers', hint: 'Felt wear and groove depth, hardness, recovered or original' },
  { key: 'shanks-flanges', area: 'Action', name: 'Shanks and flanges', hint: 'Centre pins tight or loose, cracked flanges' },
];

const STRUCTURE: Item[] = [
  { key: 'soundboard', area: 'Soundboard and bridges', name: 'Soundboard', hint: 'Cracks, crown' },
  { key: 'ribs', area: 'Soundboard and bridges', name: 'Ribs', hint: 'Ribs coming away from the board' },
  { key: 'bridges', area: 'Soundboard and bridges', name: 'Bridges', hint: 'Cracks at the bridge pins, loose pins' },
  { key: 'pinblock', area: 'Strings and tuning', name: 'Pinblock and tuning-pin torque', hint: 'New block about 12.4–13.6 N·m; 5.6 N·m or less is a concern', measure: 'tuning_pin_torque' },
  { key: 'strings', area: 'Strings and tuning', name: 'Strings', hint: 'Rust, breaks, replaced strings, dead bass strings' },
  { key: 'plate', area: 'Strings and tuning', name: 'Plate', hint: 'Cracks, loose plate bolts, finish' },
  { key: 'tuning-pitch', area: 'Strings and tuning', name: 'Tuning and pitch', hint: 'Measure A4; how far below 440 Hz', measure: 'a4_pitch' },
];

const CLOSING: Item[] = [
  { key: 'regulation', area: 'Regulation', name: 'Regulation', hint: 'Key height and dip, let-off, drop, repetition' },
  { key: 'woodworm', area: 'Woodworm', name: 'Woodworm', hint: '1–2 mm exit holes; fresh frass means active' },
];

const GRAND: Item[] = [
  ...CASE,
  { key: 'legs-castors', area: 'Case', name: 'Legs and castors', hint: 'Leg plates, castors, lyre' },
  { key: 'pedals-trapwork', area: 'Case', name: 'Pedals and trapwork', hint: 'Lyre braces, rods, springs, noises' },
  ...KEYS,
  ...ACTION,
  { key: 'repetition', area: 'Action', name: 'Repetition levers and jacks', hint: 'Springs, repetition, jack return' },
  { key: 'dampers', area: 'Dampers', name: 'Dampers', hint: 'Felts worn, moth, damping cleanly, lift' },
  ...STRUCTURE,
  ...CLOSING,
];

const UPRIGHT: Item[] = [
  ...CASE,
  { key: 'legs-castors', area: 'Case', name: 'Legs, toes and castors', hint: 'Loose toes, castors' },
  { key: 'pedals-trapwork', area: 'Case', name: 'Pedals and trapwork', hint: 'Pedal rods, springs, noises' },
  ...KEYS,
  ...ACTION,
  { key: 'repetition', area: 'Action', name: 'Jacks, butts and bridle straps', hint: 'Bridle straps, butt felts, jack springs' },
  { key: 'dampers', area: 'Dampers', name: 'Dampers', hint: 'Felts worn, moth, damping cleanly' },
  ...STRUCTURE,
  ...CLOSING,
];

const complete = (items: Item[]): SurveyTemplateItem[] => items.map((i) => ({ hint: '', measure: null, ...i }));

export const DEFAULT_SURVEY_TEMPLATES: Record<SurveyPianoType, SurveyTemplateItem[]> = {
  grand: complete(GRAND),
  upright: complete(UPRIGHT),
};

/**
 * Cautions shown where they matter. Calm and specific; they point to the rules, never replace them.
 * Weights ([S14a], consumer sources): an upright about 220–270 kg, a baby grand about 230–270 kg, a concert grand up to about 540 kg
 * (TRADE.md §7).
 */
export const CAUTIONS: Record<Caution['key'], Caution> = {
  ivory: {
    key: 'ivory',
    title: 'Ivory keytops',
    text:
      'This piano has ivory keytops. Restoring it is ordinary work, but selling, hiring out or exporting it may need an exemption or registration under local law (in the UK the Ivory Act 2018; CITES permits for export). Removed ivory keytops stay with the piano. Check the rules where you are before agreeing a sale or shipment.',
  },
  moving: {
    key: 'moving',
    title: 'Moving the piano',
    text:
      'Pianos are very heavy: an upright weighs roughly 220–270 kg and a grand from about 230 kg to over 500 kg. Collection and delivery are done by trained piano movers with proper equipment; please do not try to move it yourself. Follow local rules on manual handling and access.',
  },
};
