/**
 * Command line drafting: reads a DraftInput JSON file, writes the Draft as JSON and a true-size
 * SVG, and prints a summary in the input's unit. A bad input exits with status 1 and the
 * field messages; a usage error exits with status 2.
 *
 *   npm run draft -- --in input.json [--json out.json] [--svg out.svg]
 *
 * Printing options (--pdf, --paper, --kind) are added beside these through `draftArgsParse`.
 */
import { readFile, writeFile } from 'node:fs/promises';
import { pathToFileURL } from 'node:url';
import { parseArgs, type ParseArgsConfig } from 'node:util';
import { draft, draftToSvg, parseDraftInput, type Draft } from '../shared/engine/index';
import { lengthFormat } from '../shared/units';
import { DRAFT_PDF_ARG_OPTIONS, DRAFT_PDF_USAGE, draftPdfArgsPick, draftPdfWrite } from './draft-pdf';

/** The options the draft command understands; extend here (e.g. pdf, paper, kind). */
export const DRAFT_ARG_OPTIONS = {
  in: { type: 'string' },
  json: { type: 'string' },
  svg: { type: 'string' },
  help: { type: 'boolean', short: 'h' },
  ...DRAFT_PDF_ARG_OPTIONS,
} as const satisfies ParseArgsConfig['options'];

/** Parsed command-line arguments. */
export interface DraftArgs {
  in: string;
  json?: string;
  svg?: string;
  /** Every parsed option, so that added options reach their handler. */
  values: Record<string, string | boolean | undefined>;
}

export const USAGE = `Usage: npm run draft -- --in input.json [--json out.json] [--svg out.svg]\n${DRAFT_PDF_USAGE}`;

/** Parses the command line; throws an Error with a usage message when it cannot. */
export function draftArgsParse(argv: string[], options: ParseArgsConfig['options'] = DRAFT_ARG_OPTIONS): DraftArgs | 'help' {
  const { values } = parseArgs({ args: argv, options, allowPositionals: false, strict: true });
  if (values.help) return 'help';
  const input = values.in;
  if (typeof input !== 'string' || input === '') throw new Error(`--in is required.\n${USAGE}`);
  return {
    in: input,
    json: typeof values.json === 'string' ? values.json : undefined,
    svg: typeof values.svg === 'string' ? values.svg : undefined,
    values: values as DraftArgs['values'],
  };
}

/** A short human summary of a draft, lengths in its input's unit. */
export function draftSummary(d: Draft): string {
  const show = (mm: number) => lengthFormat(mm, d.unit);
  const lines = [
    `Tank top drafted (engine ${d.engineVersion})`,
    `  finished bust ${show(d.finished.bust)} (ease ${show(d.finished.bustEase.mm)}, ${d.finished.bustEase.percent.toFixed(1)} %), hip ${show(d.finished.hip)}, length ${show(d.finished.length)}`,
    `  stretch needed at the bust ${d.finished.stretchNeeded.toFixed(1)} %, fabric gives ${d.finished.fabricStretch} %`,
  ];
  for (const piece of d.pieces) lines.push(`  ${piece.name}: ${piece.cutNote}, ${show(piece.bounds.width)} × ${show(piece.bounds.height)}`);
  for (const b of d.bindings) {
    lines.push(`  ${b.name}: cut ${b.count} × ${show(b.cutLength)} long, ${show(b.cutWidth)} wide (opening ${show(b.openingLength)})`);
  }
  lines.push(`  layout: ${d.layout.fold}, fabric width used ${show(d.layout.widthUsed)}, length needed ${show(d.layout.lengthNeeded)}`);
  for (const w of d.warnings) lines.push(`  warning (${w.code}): ${w.message}`);
  return lines.join('\n');
}

async function main(argv: string[]): Promise<number> {
  let args: DraftArgs | 'help';
  try {
    args = draftArgsParse(argv);
  } catch (error) {
    console.error(error instanceof Error ? error.message : String(error));
    return 2;
  }
  if (args === 'help') {
    console.log(USAGE);
    return 0;
  }
  let raw: unknown;
  try {
    raw = JSON.parse(await readFile(args.in, 'utf8'));
  } catch (error) {
    console.error(`Cannot read ${args.in} as JSON: ${error instanceof Error ? error.message : String(error)}`);
    return 1;
  }
  const parsed = parseDraftInput(raw);
  if (!parsed.ok) {
    console.error(`The input cannot be drafted:`);
    for (const e of parsed.errors) console.error(`  ${e.path || '(input)'}: ${e.message}`);
    return 1;
  }
  const result = draft(parsed.input);
  if (!result.ok) {
    console.error(`The input cannot be drafted:`);
    for (const e of result.errors) console.error(`  ${e.path || '(input)'}: ${e.message}`);
    return 1;
  }
  if (args.json) await writeFile(args.json, `${JSON.stringify(result.draft, null, 2)}\n`);
  if (args.svg) await writeFile(args.svg, draftToSvg(result.draft));
  console.log(draftSummary(result.draft));
  if (args.values.pdf !== undefined) {
    const written = await draftPdfWrite(result.draft, draftPdfArgsPick(args.values));
    if (!written.ok) {
      console.error(`The PDF cannot be made:`);
      for (const e of written.errors) console.error(`  ${e.path}: ${e.message}`);
      return 1;
    }
    console.log(`PDF written: ${written.path}, ${written.pageCount} pages, ${(written.bytes / 1024).toFixed(1)} KB`);
  }
  return 0;
}

// Run only when executed as a script, so that the argument parsing can be imported and extended.
if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  process.exitCode = await main(process.argv.slice(2));
}
