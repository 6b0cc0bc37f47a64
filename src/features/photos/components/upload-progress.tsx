/** How much of an upload has been sent, as a bar and as words. */
export function UploadProgress({ fraction, label = 'Uploading' }: { fraction: number; label?: string }) {
  const pct = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <div className="flex flex-col gap-1.5" data-testid="upload-progress">
      <div className="flex justify-between text-sm">
        <span>{pct < 100 ? `${label}…` : 'Processing the photo…'}</span>
        <span className="num font-medium">{pct} %</span>
      </div>
      <div
        role="progressbar"
        aria-label={`${label} progress`}
        aria-valuemin={0}
        aria-valuemax={100}
        aria-valuenow={pct}
        className="h-2.5 w-full overflow-hidden rounded-full bg-surface ring-1 ring-line"
      >
        <div className="h-full rounded-full bg-accent transition-[width]" style={{ width: `${pct}%` }} />
      </div>
    </div>
  );
}
