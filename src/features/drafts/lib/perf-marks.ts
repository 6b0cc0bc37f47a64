/**
 * Performance marks for the time from a parameter's input event to the redrawn pattern being in
 * the DOM (read by scripts/bench-ui.ts). Marks are cheap; the entries are trimmed so a long
 * session does not pile them up.
 */
export const PARAM_INPUT_MARK = 'kw:param-input';
export const REDRAW_MEASURE = 'kw:redraw';
const KEEP_MEASURES = 500;

let pending = false;

/**
 * Called in a parameter's input handler with the event's time stamp (when the input happened,
 * on the performance clock), so the measure starts at the input and not at the handler.
 */
export function paramInputMark(eventTime?: number): void {
  performance.mark(PARAM_INPUT_MARK, eventTime === undefined ? undefined : { startTime: eventTime });
  pending = true;
}

/** Called once the canvas has committed the redrawn pieces. */
export function redrawMeasure(): void {
  if (!pending) return;
  pending = false;
  performance.measure(REDRAW_MEASURE, PARAM_INPUT_MARK);
  performance.clearMarks(PARAM_INPUT_MARK);
  if (performance.getEntriesByName(REDRAW_MEASURE, 'measure').length > KEEP_MEASURES) performance.clearMeasures(REDRAW_MEASURE);
}
