/**
 * The eighths of an inch as one-tap keys for a tablet's number pad, which has no space or
 * slash: type "35", tap "½", and the field reads "35½" (a form the shared parser accepts).
 */

/** Each key's glyph and how it is read aloud. */
export const FRACTION_KEYS: readonly { glyph: string; spoken: string }[] = [
  { glyph: '⅛', spoken: 'one eighth' },
  { glyph: '¼', spoken: 'one quarter' },
  { glyph: '⅜', spoken: 'three eighths' },
  { glyph: '½', spoken: 'one half' },
  { glyph: '⅝', spoken: 'five eighths' },
  { glyph: '¾', spoken: 'three quarters' },
  { glyph: '⅞', spoken: 'seven eighths' },
];

const GLYPHS = FRACTION_KEYS.map((k) => k.glyph).join('');
/** A whole number followed by a fraction already typed: "35½", "35 1/4", "35.5" keeps only "35". */
const WHOLE_THEN_PART = new RegExp(`^\\s*(\\d+)\\s*(?:[${GLYPHS}]|\\d+\\s*/\\s*\\d*|[.,]\\d*)?\\s*$`);

/**
 * The text after tapping a fraction key: the whole inches typed so far plus that fraction,
 * replacing any fraction or decimal already there. Text that is not a number yet gets the
 * fraction on its own, so a tap is never lost.
 */
export function fractionApply(text: string, glyph: string): string {
  const match = WHOLE_THEN_PART.exec(text);
  if (match?.[1] !== undefined) return `${match[1]}${glyph}`;
  return text.trim() === '' ? glyph : `${text.trim()}${glyph}`;
}
