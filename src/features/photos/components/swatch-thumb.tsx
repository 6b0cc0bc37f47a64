import { useSwatches } from '../api/get-swatches';

/**
 * A small swatch beside a fabric's name in a list; an empty square when it has none. All the
 * studio's swatches come in one request, shared by every row.
 */
export function SwatchThumb({ fabricId }: { fabricId: number }) {
  const swatches = useSwatches();
  const swatch = swatches.data?.items.find((s) => s.fabricId === fabricId);
  return (
    <span className="inline-flex h-10 w-10 shrink-0 overflow-hidden rounded-md border border-line bg-surface" aria-hidden="true">
      {swatch && <img src={swatch.thumbUrl} alt="" className="h-full w-full object-cover" loading="lazy" />}
    </span>
  );
}
