/**
 * The body measurements a studio takes at a fitting, with where the tape goes.
 *
 * Terms follow ISO 8559-1:2017 (anthropometric definitions for body measurement) where the
 * standard has one; `isoTerm` is null for the pattern-making measurements it does not name.
 * The ISO terms are quoted from memory of the standard; every definition is Knitwright's own
 * wording of how the measurement is taken. Bust girth follows EN 13402-1.
 *
 * Two ranges per field, in mm:
 * - `plausibleMm`: the usual range for adult women; a value outside it draws a warning but
 *   may be saved (generous ranges from common practice and memory, not from a survey);
 * - `limitMm`: what any body could measure; a value outside it is refused as a typing slip.
 *   The girth and armhole limits match the drafting input's limits.
 */

/** The key of every measurement, in the order fitting mode asks for them. */
export const MEASUREMENT_KEYS = [
  'bust',
  'highBust',
  'underbust',
  'waist',
  'hip',
  'neckBase',
  'shoulderLength',
  'acrossBack',
  'acrossFront',
  'napeToWaist',
  'shoulderToBust',
  'armholeDepth',
  'shoulderToHip',
  'upperArm',
  'armLength',
  'wrist',
] as const;

/** One measurement's key. */
export type MeasurementKey = (typeof MEASUREMENT_KEYS)[number];

/** The measurements needed to draft a tank top. */
export const TANK_REQUIRED_KEYS = ['bust', 'hip', 'armholeDepth'] as const satisfies readonly MeasurementKey[];

/** A range in mm. */
export interface MmRange {
  min: number;
  max: number;
}

/** A measurement, how it is taken, and what values make sense. */
export interface MeasurementField {
  key: MeasurementKey;
  /** Short label for forms and tables. */
  label: string;
  /** A girth goes round the body; a length goes along it. */
  kind: 'girth' | 'length';
  /** The ISO 8559-1 term, or null when the standard does not name this measurement. */
  isoTerm: string | null;
  /** Where the tape goes, in the trade's words. */
  definition: string;
  /** Where the definition comes from. */
  source: string;
  /** Needed to draft a tank top; a measurement set must have it. */
  requiredForTank: boolean;
  /** Usual adult range in mm; outside it the fitting screen warns. */
  plausibleMm: MmRange;
  /** Accepted range in mm; outside it the value is refused. */
  limitMm: MmRange;
}

const ISO = 'ISO 8559-1:2017 term (from memory); definition in our words';
const TRADE = 'pattern-making measurement (common practice); definition in our words';

/** Every measurement a set can hold, in fitting order. */
export const MEASUREMENT_FIELDS: readonly MeasurementField[] = [
  {
    key: 'bust',
    label: 'Bust girth',
    kind: 'girth',
    isoTerm: 'bust girth',
    definition:
      'Maximum horizontal girth during normal breathing, with the tape under the armpits and over the bust prominence.',
    source: 'EN 13402-1; ISO 8559-1:2017 term',
    requiredForTank: true,
    plausibleMm: { min: 700, max: 1500 },
    limitMm: { min: 500, max: 2000 },
  },
  {
    key: 'highBust',
    label: 'High bust (chest) girth',
    kind: 'girth',
    isoTerm: 'chest girth',
    definition: 'Horizontal girth high under the armpits, above the bust, with the tape across the shoulder blades.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 650, max: 1400 },
    limitMm: { min: 450, max: 1900 },
  },
  {
    key: 'underbust',
    label: 'Underbust girth',
    kind: 'girth',
    isoTerm: 'underbust girth',
    definition: 'Horizontal girth of the rib cage just below the breasts.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 600, max: 1300 },
    limitMm: { min: 400, max: 1800 },
  },
  {
    key: 'waist',
    label: 'Waist girth',
    kind: 'girth',
    isoTerm: 'waist girth',
    definition: 'Horizontal girth at the natural waist, the narrowest part of the torso between the ribs and the hip bones.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 550, max: 1400 },
    limitMm: { min: 400, max: 2000 },
  },
  {
    key: 'hip',
    label: 'Hip girth',
    kind: 'girth',
    isoTerm: 'hip girth',
    definition: 'Horizontal girth at the fullest part of the buttocks, feet together.',
    source: ISO,
    requiredForTank: true,
    plausibleMm: { min: 800, max: 1600 },
    limitMm: { min: 500, max: 2200 },
  },
  {
    key: 'neckBase',
    label: 'Neck base girth',
    kind: 'girth',
    isoTerm: 'neck base girth',
    definition: 'Girth round the base of the neck, through the nape, the sides of the neck base and the top of the breastbone.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 300, max: 480 },
    limitMm: { min: 200, max: 700 },
  },
  {
    key: 'shoulderLength',
    label: 'Shoulder length',
    kind: 'length',
    isoTerm: 'shoulder length',
    definition: 'From the side of the neck base to the shoulder point, along the top of the shoulder.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 90, max: 170 },
    limitMm: { min: 50, max: 250 },
  },
  {
    key: 'acrossBack',
    label: 'Across back',
    kind: 'length',
    isoTerm: null,
    definition: 'Across the shoulder blades from one armhole crease to the other, about halfway down the armhole.',
    source: TRADE,
    requiredForTank: false,
    plausibleMm: { min: 280, max: 450 },
    limitMm: { min: 150, max: 650 },
  },
  {
    key: 'acrossFront',
    label: 'Across front',
    kind: 'length',
    isoTerm: null,
    definition: 'Across the chest from one armhole crease to the other, about halfway down the armhole, above the bust.',
    source: TRADE,
    requiredForTank: false,
    plausibleMm: { min: 260, max: 430 },
    limitMm: { min: 150, max: 650 },
  },
  {
    key: 'napeToWaist',
    label: 'Nape to waist',
    kind: 'length',
    isoTerm: null,
    definition: 'Down the centre back from the prominent neck bone at the nape to the natural waist.',
    source: TRADE,
    requiredForTank: false,
    plausibleMm: { min: 350, max: 480 },
    limitMm: { min: 250, max: 650 },
  },
  {
    key: 'shoulderToBust',
    label: 'High shoulder to bust point',
    kind: 'length',
    isoTerm: null,
    definition: 'From the side of the neck base at the top of the shoulder straight down to the bust point.',
    source: TRADE,
    requiredForTank: false,
    plausibleMm: { min: 200, max: 330 },
    limitMm: { min: 120, max: 450 },
  },
  {
    key: 'armholeDepth',
    label: 'Armhole depth',
    kind: 'length',
    isoTerm: null,
    definition: 'From the shoulder line straight down to the underarm level, taken at the back of the armhole.',
    source: TRADE,
    requiredForTank: true,
    plausibleMm: { min: 170, max: 260 },
    limitMm: { min: 100, max: 400 },
  },
  {
    key: 'shoulderToHip',
    label: 'Shoulder to hip',
    kind: 'length',
    isoTerm: null,
    definition: 'From the side of the neck base at the top of the shoulder down over the bust to the hip level.',
    source: TRADE,
    requiredForTank: false,
    plausibleMm: { min: 500, max: 720 },
    limitMm: { min: 350, max: 1000 },
  },
  {
    key: 'upperArm',
    label: 'Upper arm girth',
    kind: 'girth',
    isoTerm: 'upper arm girth',
    definition: 'Girth round the fullest part of the upper arm, arm hanging relaxed.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 220, max: 450 },
    limitMm: { min: 150, max: 650 },
  },
  {
    key: 'armLength',
    label: 'Arm length',
    kind: 'length',
    isoTerm: 'arm length',
    definition: 'From the shoulder point over the slightly bent elbow to the wrist bone.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 500, max: 650 },
    limitMm: { min: 350, max: 850 },
  },
  {
    key: 'wrist',
    label: 'Wrist girth',
    kind: 'girth',
    isoTerm: 'wrist girth',
    definition: 'Girth round the wrist over the wrist bone.',
    source: ISO,
    requiredForTank: false,
    plausibleMm: { min: 130, max: 200 },
    limitMm: { min: 100, max: 300 },
  },
];

const BY_KEY = new Map(MEASUREMENT_FIELDS.map((f) => [f.key, f]));

/** The field of `key`. */
export function measurementField(key: MeasurementKey): MeasurementField {
  const field = BY_KEY.get(key);
  if (!field) throw new Error(`Unknown measurement ${key}`);
  return field;
}

/** Measurement values in mm: the tank top's three are always there, the rest when taken. */
export type MeasurementValuesMm = { bust: number; hip: number; armholeDepth: number } & Partial<
  Record<Exclude<MeasurementKey, (typeof TANK_REQUIRED_KEYS)[number]>, number>
>;
