/**
 * PDF benchmark: time and size of the tiled Letter PDF of the demo tank top, beside a
 * baseline made in the same run that draws the same paths again on every page instead of
 * painting one reusable form object. Also a longer tank dress on Letter (about 20 pages).
 * Target: a 20-page document well under 100 ms and under 100 KB.
 * Run: node --import tsx scripts/bench-pdf.ts [--runs N]
 */
import { performance } from 'node:perf_hooks';
import { availableParallelism, loadavg } from 'node:os';
import { parseArgs } from 'node:util';
import { jsPDF } from 'jspdf';
import { draft, type Draft, type DraftInput } from '../shared/engine/index';
import { pdfBytes, pdfDocumentBuild, PDF_BASE_OPTIONS } from '../shared/engine/export/pdf-document';
import { pt } from '../shared/engine/export/pdf-draw';
import { pdfTilesWrite } from '../shared/engine/export/pdf-tiles';
import { draftTilesPlan } from '../shared/engine/layout/tiling-draft';
import { EXAMPLE_INPUT } from '../shared/engine/test-support/inputs';

const { values } = parseArgs({ options: { runs: { type: 'string', default: '40' } } });
const runs = Math.max(5, Number(values.runs) || 40);

const inputs: Record<string, DraftInput> = {
  // the demo tank top: the engine's worked command-line input
  'demo tank top': EXAMPLE_INPUT,
  // a long tank dress for a larger body: about twice the pages
  'long tank dress': {
    unit: 'cm',
    measurements: { bust: 112, hip: 124, waist: 100, armholeDepth: 24 },
    fabric: { stretch: 50, recovery: 'good' },
    style: 'tank',
    params: { length: 105, bustEase: -8, frontNeckDepth: 16 },
  },
};

function drafted(input: DraftInput): Draft {
  const result = draft(input);
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return result.draft;
}

/** The tiled Letter document, pattern reused through one form object or drawn on every page. */
function tiles(d: Draft, reuse: boolean): Uint8Array {
  const laid = draftTilesPlan(d, { paper: 'letter', titleLineCount: 6 });
  const { sheet, orientation } = laid.plan;
  const doc = new jsPDF({ ...PDF_BASE_OPTIONS, format: [pt(sheet.widthMm), pt(sheet.heightMm)], orientation });
  const titleLines = ['Tank top', 'benchmark', 'Print at 100 %', 'Measure both squares', 'Trim and match', 'Every page printed'];
  pdfTilesWrite(doc, { ...laid, titleLines, reuse });
  doc.viewerPreferences({ PrintScaling: 'None' });
  return pdfBytes(doc);
}

/** The document as the app builds it (options checked, title block filled). */
function full(d: Draft): Uint8Array {
  const result = pdfDocumentBuild(jsPDF, d, { kind: 'tiles', paper: 'letter', meta: { client: 'Ines Varga', date: '2025-03-14' } });
  if (!result.ok) throw new Error(JSON.stringify(result.errors));
  return pdfBytes(result.doc);
}

function median(times: number[]): number {
  const sorted = [...times].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

/**
 * Wall time, and CPU time of this process (user + system): on a loaded machine the CPU time
 * is what the document costs, the wall time what it also waits for others.
 */
function measure(make: () => Uint8Array): { first: number; median: number; cpu: number; bytes: number } {
  let start = performance.now();
  const bytes = make().byteLength;
  const first = performance.now() - start;
  const times: number[] = [];
  const cpus: number[] = [];
  for (let i = 0; i < runs; i++) {
    const cpuStart = process.cpuUsage();
    start = performance.now();
    make();
    times.push(performance.now() - start);
    const cpu = process.cpuUsage(cpuStart);
    cpus.push((cpu.user + cpu.system) / 1000);
  }
  return { first, median: median(times), cpu: median(cpus), bytes };
}

const kb = (bytes: number): string => `${(bytes / 1024).toFixed(1)} KB`;
const ms = (time: number): string => `${time.toFixed(1)} ms`;

console.log(`PDF benchmark: ${runs} runs each after one cold run; medians, whole document (plan, draw, compress, bytes)`);
console.log(`load average ${loadavg().map((n) => n.toFixed(1)).join(' ')} on ${availableParallelism()} cores`);
for (const [name, input] of Object.entries(inputs)) {
  const d = drafted(input);
  const pages = draftTilesPlan(d, { paper: 'letter', titleLineCount: 6 }).plan.pageCount;
  const reused = measure(() => tiles(d, true));
  const baseline = measure(() => tiles(d, false));
  const app = measure(() => full(d));
  console.log(`\n${name}, tiled Letter, ${pages} pages`);
  const row = (label: string, m: ReturnType<typeof measure>): string =>
    `  ${label.padEnd(21)} wall ${ms(m.median).padStart(9)}  cpu ${ms(m.cpu).padStart(9)}  first ${ms(m.first).padStart(9)}  size ${kb(m.bytes)}`;
  console.log(row('form object reused', reused));
  console.log(row('drawn on every page', baseline));
  console.log(row('as the app builds it', app));
  console.log(`  reuse saves ${(100 * (1 - reused.bytes / baseline.bytes)).toFixed(0)} % of the size, ${(100 * (1 - reused.cpu / baseline.cpu)).toFixed(0)} % of the CPU time`);
}
