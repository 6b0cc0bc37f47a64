import { useState } from 'react';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { Dialog } from '@/components/ui/dialog';
import { LoadingState } from '@/components/ui/loading-state';
import { ApiError } from '@/lib/api-client';
import { useDeleteSwatch, usePutSwatch } from '../api/change-swatch';
import { useSwatch } from '../api/get-swatches';
import { bytesFormat } from '../lib/photo-labels';
import { ImageDropzone } from './image-dropzone';
import { UploadProgress } from './upload-progress';

export interface FabricSwatchProps {
  fabricId: number;
  fabricName: string;
  /** Owners add, replace and remove the swatch; everyone in the studio sees it. */
  canEdit: boolean;
}

/** The fabric's swatch photo, to match a knit on the shelf with its record. */
export function FabricSwatch({ fabricId, fabricName, canEdit }: FabricSwatchProps) {
  const swatch = useSwatch(fabricId);
  const put = usePutSwatch(fabricId);
  const remove = useDeleteSwatch(fabricId);
  const [file, setFile] = useState<File | null>(null);
  const [viewing, setViewing] = useState(false);
  const current = swatch.data?.swatch ?? null;
  const uploadError = put.error instanceof ApiError ? (put.error.fields.photo ?? put.error.message) : put.error?.message;

  return (
    <Card title="Swatch" description="A photo of the knit, face side up, in daylight.">
      {swatch.isPending && <LoadingState>Loading the swatch…</LoadingState>}
      {swatch.isError && <Alert tone="error">{swatch.error.message}</Alert>}
      {swatch.data && (
        <div className="flex flex-col gap-4">
          {current ? (
            <button type="button" onClick={() => setViewing(true)} className="self-start rounded-lg" aria-label={`Open the swatch of ${fabricName} at full size`}>
              <img
                src={current.thumbUrl}
                alt=""
                width={current.thumbWidth}
                height={current.thumbHeight}
                className="max-h-48 w-auto rounded-lg border border-line object-contain"
                data-testid="swatch-thumb"
              />
            </button>
          ) : (
            <p className="text-muted">{canEdit ? 'No swatch yet: add a photo of the knit.' : 'No swatch yet.'}</p>
          )}
          {canEdit && (
            <>
              <ImageDropzone what="swatch photo" file={file} onFile={setFile} error={uploadError} disabled={put.isPending} />
              {put.progress !== null && <UploadProgress fraction={put.progress} />}
              <div className="flex flex-wrap gap-2">
                <Button variant="primary" disabled={!file} pending={put.isPending} pendingLabel="Uploading…" onClick={() => file && put.mutate(file, { onSuccess: () => setFile(null) })}>
                  {current ? 'Replace swatch' : 'Save swatch'}
                </Button>
                {current && (
                  <Button variant="ghost" pending={remove.isPending} pendingLabel="Removing…" onClick={() => remove.mutate()}>
                    Remove swatch
                  </Button>
                )}
              </div>
              {remove.isError && <Alert tone="error" title="Not removed">{remove.error.message}</Alert>}
            </>
          )}
        </div>
      )}
      <Dialog
        open={viewing && current !== null}
        onClose={() => setViewing(false)}
        title={`Swatch of ${fabricName}`}
        className="max-w-3xl!"
        description={current && <span className="num">{current.width} × {current.height} px · {bytesFormat(current.bytes)}</span>}
        footer={
          <Button variant="primary" onClick={() => setViewing(false)}>
            Close
          </Button>
        }
      >
        {current && <img src={current.fullUrl} alt={`Swatch of ${fabricName}`} className="mx-auto max-h-[65vh] w-auto max-w-full rounded-md object-contain" />}
      </Dialog>
    </Card>
  );
}
