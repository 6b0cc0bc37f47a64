import { useEffect, useId, useRef, useState } from 'react';
import { useDropzone, type FileRejection } from 'react-dropzone';
import { PHOTO_MAX_BYTES } from '@shared/schemas/photo';
import { Button } from '@/components/ui/button';
import { cx } from '@/components/ui/cx';
import { bytesFormat } from '../lib/photo-labels';

export interface ImageDropzoneProps {
  file: File | null;
  onFile: (file: File | null) => void;
  /** The field's error (from the server or from the checks here). */
  error?: string;
  disabled?: boolean;
  /** What the picker is for, e.g. "fitting photo". */
  what: string;
}

function rejectionMessage(rejections: FileRejection[]): string {
  const code = rejections[0]?.errors[0]?.code;
  if (code === 'file-too-large') return `The file is larger than ${PHOTO_MAX_BYTES / 1024 / 1024} MB: export the photo smaller and try again.`;
  if (code === 'too-many-files') return 'Choose one photo at a time.';
  return 'This file is not an image: choose a JPEG, PNG or WebP photo.';
}

function isCoarsePointer(): boolean {
  return typeof window !== 'undefined' && typeof window.matchMedia === 'function' && window.matchMedia('(pointer: coarse)').matches;
}

/**
 * Drag a photo in or choose one; on a tablet or phone the camera is offered too. The server
 * decides by the file's bytes; the checks here only save a pointless upload.
 */
export function ImageDropzone({ file, onFile, error, disabled, what }: ImageDropzoneProps) {
  const [localError, setLocalError] = useState<string | null>(null);
  const [chosen, setChosen] = useState<{ file: File; url: string } | null>(null);
  const lastUrl = useRef<string | null>(null);
  const [coarse] = useState(isCoarsePointer);
  const camera = useRef<HTMLInputElement>(null);
  const errorId = useId();
  const shown = localError ?? error;

  // The preview follows the parent's `file`: a reset there (after a save) hides it.
  const preview = chosen && chosen.file === file ? chosen.url : null;
  useEffect(
    () => () => {
      if (lastUrl.current) URL.revokeObjectURL(lastUrl.current);
    },
    [],
  );

  function pick(next: File | null) {
    if (lastUrl.current) URL.revokeObjectURL(lastUrl.current);
    const url = next ? URL.createObjectURL(next) : null;
    lastUrl.current = url;
    setChosen(next && url ? { file: next, url } : null);
    onFile(next);
  }

  const { getRootProps, getInputProps, isDragActive, open } = useDropzone({
    accept: { 'image/*': [] },
    maxSize: PHOTO_MAX_BYTES,
    multiple: false,
    noClick: true,
    noKeyboard: true,
    disabled,
    onDropAccepted: (files) => {
      setLocalError(null);
      pick(files[0] ?? null);
    },
    onDropRejected: (rejections) => {
      setLocalError(rejectionMessage(rejections));
      pick(null);
    },
  });

  return (
    <div className="flex flex-col gap-1.5">
      <span className="text-sm font-medium">{what[0]?.toUpperCase() + what.slice(1)}</span>
      <div
        {...getRootProps({
          className: cx(
            'flex flex-col items-center gap-3 rounded-lg border-2 border-dashed px-4 py-6 text-center',
            isDragActive ? 'border-accent bg-accent-soft' : shown ? 'border-danger' : 'border-line bg-surface/50',
          ),
        })}
      >
        <input {...getInputProps({ 'aria-label': `Choose a ${what}`, 'aria-describedby': shown ? errorId : undefined })} data-testid="photo-file" />
        {preview && file ? (
          <figure className="flex flex-col items-center gap-2">
            <img src={preview} alt={`The chosen ${what}`} className="max-h-48 rounded-md border border-line object-contain" />
            <figcaption className="text-sm text-muted">
              {file.name} · <span className="num">{bytesFormat(file.size)}</span>
            </figcaption>
          </figure>
        ) : (
          <p className="text-muted">{isDragActive ? 'Drop the photo here.' : `Drag a ${what} here, or choose one.`}</p>
        )}
        <div className="flex flex-wrap justify-center gap-2">
          <Button onClick={open} disabled={disabled} compact>
            {file ? 'Choose another' : 'Choose a photo'}
          </Button>
          {coarse && (
            <Button onClick={() => camera.current?.click()} disabled={disabled} compact>
              Take a photo
            </Button>
          )}
        </div>
        {coarse && (
          <input
            ref={camera}
            type="file"
            accept="image/*"
            capture="environment"
            className="sr-only"
            tabIndex={-1}
            aria-hidden="true"
            onChange={(event) => {
              const taken = event.target.files?.[0] ?? null;
              if (taken && taken.size > PHOTO_MAX_BYTES) {
                setLocalError(rejectionMessage([{ file: taken, errors: [{ code: 'file-too-large', message: '' }] }]));
                return pick(null);
              }
              setLocalError(null);
              pick(taken);
            }}
          />
        )}
      </div>
      {shown && (
        <p id={errorId} role="alert" className="text-sm font-medium text-danger">
          {shown}
        </p>
      )}
      <p className="text-sm text-muted">JPEG, PNG or WebP, up to {PHOTO_MAX_BYTES / 1024 / 1024} MB. Location and camera details are removed when it is saved.</p>
    </div>
  );
}
