import type { PdfKind } from '@shared/engine/export/pdf-options';

const ADVICE: Record<PdfKind, string[]> = {
  tiles: [
    'Print at 100 % (actual size), never "fit to page".',
    'Print page 1 first and measure its 2 in and 5 cm squares with a ruler before printing the rest.',
    'Trim each page along its dashed line, lay it over its neighbour and match the diamonds and labels (A1, A2, … B1, …).',
  ],
  sheet: [
    'Ask the copy shop to print at 100 % (actual size), with no scaling.',
    'Measure the 2 in and 5 cm squares on the sheet before cutting.',
  ],
  ticket: [
    'One page for the cutter, lengths in the unit named above.',
    'It repeats the cautions for rotary cutters, overlocker blades, steam irons and sealing synthetic tape with a flame: follow them and your local safety rules.',
  ],
};

/** How to print what was chosen so it comes out at true scale, and the cautions. */
export function PrintAdvice({ kind }: { kind: PdfKind }) {
  return (
    <ul className="list-disc space-y-1 pl-5 text-sm text-ink" data-testid="print-advice">
      {ADVICE[kind].map((line) => (
        <li key={line}>{line}</li>
      ))}
    </ul>
  );
}
