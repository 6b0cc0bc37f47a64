/**
 * Zoom, pan and fit for the pattern canvas, by mouse, touch and keyboard. Pointer events cover
 * mouse, pen and fingers alike: one pointer pans, two pinch to zoom about their midpoint. A
 * press that does not move is a tap, handed to `onTap` with the element under it.
 */
import { useCallback, useEffect, useLayoutEffect, useRef, useState, type KeyboardEvent, type PointerEvent, type RefObject } from 'react';
import { viewFit, viewPan, viewZoomAt, type Rect, type Size, type View } from '../lib/view-transform';

/** A press that moves less than this is a tap, px. */
const TAP_SLOP_PX = 6;
/** One zoom button press or key, and one wheel notch (about 100 px of delta). */
const ZOOM_STEP = 1.25;
const PAN_STEP_PX = 48;

interface Tracked {
  x: number;
  y: number;
}

export interface CanvasView {
  containerRef: RefObject<HTMLDivElement | null>;
  size: Size;
  view: View;
  fit: () => void;
  zoomBy: (factor: number) => void;
  onPointerDown: (e: PointerEvent<SVGSVGElement>) => void;
  onPointerMove: (e: PointerEvent<SVGSVGElement>) => void;
  onPointerUp: (e: PointerEvent<SVGSVGElement>) => void;
  onPointerCancel: (e: PointerEvent<SVGSVGElement>) => void;
  onKeyDown: (e: KeyboardEvent<HTMLElement>) => void;
}

export function useCanvasView(content: Rect, fitKey: string, onTap: (target: Element | null) => void): CanvasView {
  const containerRef = useRef<HTMLDivElement | null>(null);
  const [size, setSize] = useState<Size>({ width: 0, height: 0 });
  const [view, setView] = useState<View>({ scale: 1, x: 0, y: 0 });
  const pointers = useRef(new Map<number, Tracked>());
  const press = useRef<{ x: number; y: number; target: Element | null; moved: boolean } | null>(null);
  // Until the person zooms or pans, the drawing follows the canvas size; after that it stays put.
  const autoFit = useRef(true);
  const contentRef = useRef(content);
  useLayoutEffect(() => {
    contentRef.current = content;
  }, [content]);

  const fit = useCallback(() => {
    autoFit.current = true;
    setView(viewFit(contentRef.current, sizeOf(containerRef.current)));
  }, []);

  useEffect(() => {
    const element = containerRef.current;
    if (!element) return;
    const observer = new ResizeObserver(() => {
      const next = sizeOf(element);
      setSize((prev) => (prev.width === next.width && prev.height === next.height ? prev : next));
      if (autoFit.current) setView(viewFit(contentRef.current, next));
    });
    observer.observe(element);
    return () => observer.disconnect();
  }, []);

  // A new arrangement (side by side ↔ overlaid, another draft) fits again; a slider drag does not.
  useEffect(() => {
    fit();
  }, [fitKey, fit]);

  const zoomBy = useCallback((factor: number) => {
    autoFit.current = false;
    const element = containerRef.current;
    const { width, height } = sizeOf(element);
    setView((v) => viewZoomAt(v, factor, { x: width / 2, y: height / 2 }));
  }, []);

  useEffect(() => {
    const element = containerRef.current;
    if (!element) return;
    const onWheel = (e: WheelEvent) => {
      e.preventDefault();
      autoFit.current = false;
      const box = element.getBoundingClientRect();
      const at = { x: e.clientX - box.left, y: e.clientY - box.top };
      if (e.ctrlKey || e.metaKey || e.deltaMode !== 0 || Math.abs(e.deltaY) >= 50) {
        // Pinch on a trackpad arrives as ctrl + wheel; a mouse wheel as large steps: both zoom.
        const factor = Math.pow(ZOOM_STEP, -e.deltaY / (e.ctrlKey ? 25 : 100));
        setView((v) => viewZoomAt(v, factor, at));
      } else {
        setView((v) => viewPan(v, -e.deltaX, -e.deltaY));
      }
    };
    element.addEventListener('wheel', onWheel, { passive: false });
    return () => element.removeEventListener('wheel', onWheel);
  }, []);

  const local = (e: PointerEvent<SVGSVGElement>): Tracked => {
    const box = e.currentTarget.getBoundingClientRect();
    return { x: e.clientX - box.left, y: e.clientY - box.top };
  };

  const onPointerDown = (e: PointerEvent<SVGSVGElement>) => {
    if (e.button !== 0 && e.pointerType === 'mouse') return;
    const p = local(e);
    pointers.current.set(e.pointerId, p);
    press.current = pointers.current.size === 1 ? { ...p, target: e.target as Element, moved: false } : null;
    e.currentTarget.setPointerCapture(e.pointerId);
  };

  const onPointerMove = (e: PointerEvent<SVGSVGElement>) => {
    const previous = pointers.current.get(e.pointerId);
    if (!previous) return;
    const p = local(e);
    const others = [...pointers.current.entries()].filter(([id]) => id !== e.pointerId);
    const other = others[0]?.[1];
    if (press.current && Math.hypot(p.x - press.current.x, p.y - press.current.y) > TAP_SLOP_PX) press.current.moved = true;
    if (press.current && !press.current.moved) {
      pointers.current.set(e.pointerId, p);
      return;
    }
    autoFit.current = false;
    if (other) {
      // Pinch: scale by the change in finger distance about the midpoint, and follow the midpoint.
      const before = Math.hypot(previous.x - other.x, previous.y - other.y);
      const after = Math.hypot(p.x - other.x, p.y - other.y);
      const mid = { x: (p.x + other.x) / 2, y: (p.y + other.y) / 2 };
      const factor = before > 0 ? after / before : 1;
      setView((v) => viewPan(viewZoomAt(v, factor, mid), (p.x - previous.x) / 2, (p.y - previous.y) / 2));
    } else {
      setView((v) => viewPan(v, p.x - previous.x, p.y - previous.y));
    }
    pointers.current.set(e.pointerId, p);
  };

  const onPointerEnd = (e: PointerEvent<SVGSVGElement>, tap: boolean) => {
    pointers.current.delete(e.pointerId);
    if (tap && press.current && !press.current.moved) onTap(press.current.target);
    if (pointers.current.size === 0) press.current = null;
  };

  const onKeyDown = (e: KeyboardEvent<HTMLElement>) => {
    const pans: Record<string, [number, number]> = {
      ArrowLeft: [PAN_STEP_PX, 0],
      ArrowRight: [-PAN_STEP_PX, 0],
      ArrowUp: [0, PAN_STEP_PX],
      ArrowDown: [0, -PAN_STEP_PX],
    };
    const pan = pans[e.key];
    if (pan) {
      autoFit.current = false;
      setView((v) => viewPan(v, pan[0], pan[1]));
    } else if (e.key === '+' || e.key === '=') zoomBy(ZOOM_STEP);
    else if (e.key === '-' || e.key === '_') zoomBy(1 / ZOOM_STEP);
    else if (e.key === '0') fit();
    else return;
    e.preventDefault();
  };

  return {
    containerRef,
    size,
    view,
    fit,
    zoomBy,
    onPointerDown,
    onPointerMove,
    onPointerUp: (e) => onPointerEnd(e, true),
    onPointerCancel: (e) => onPointerEnd(e, false),
    onKeyDown,
  };
}

function sizeOf(element: HTMLElement | null): Size {
  if (!element) return { width: 0, height: 0 };
  return { width: element.clientWidth, height: element.clientHeight };
}

export { ZOOM_STEP };
