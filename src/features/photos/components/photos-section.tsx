import { useState } from 'react';
import type { PhotoView } from '@shared/schemas/photo';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Card } from '@/components/ui/card';
import { LoadingState } from '@/components/ui/loading-state';
import { usePhotos } from '../api/get-photos';
import { KIND_LABEL, dayFormat } from '../lib/photo-labels';
import { PhotoUploadDialog, type PhotoSetOption } from './photo-upload-dialog';
import { PhotoViewer } from './photo-viewer';

export interface PhotosSectionProps {
  clientId: number;
  clientName: string;
  /** Owners add and delete photos (not on an archived client); everyone in the studio views them. */
  canEdit: boolean;
  /** The client's measurement sets, newest first, for "goes with the fitting". */
  sets: PhotoSetOption[];
}

/** The client's fitting photos as a grid of thumbnails; each opens at full size. */
export function PhotosSection({ clientId, clientName, canEdit, sets }: PhotosSectionProps) {
  const photos = usePhotos(clientId);
  const [adding, setAdding] = useState(false);
  const [viewing, setViewing] = useState<PhotoView | null>(null);
  const items = photos.data?.items ?? [];

  return (
    <Card
      title="Fitting photos"
      description="Front, side and back views from each fitting, to compare the fit over time. Only members of the studio can see them."
      actions={
        canEdit && (
          <Button variant="primary" onClick={() => setAdding(true)} data-testid="photo-add">
            Add photo
          </Button>
        )
      }
    >
      {photos.isPending && <LoadingState>Loading the photos…</LoadingState>}
      {photos.isError && <Alert tone="error">{photos.error.message}</Alert>}
      {photos.data && items.length === 0 && (
        <p className="rounded-lg border border-dashed border-line px-4 py-8 text-center text-muted">
          {canEdit ? 'No photos yet. Add front, side and back views at the next fitting.' : 'No photos yet. An owner adds them at a fitting.'}
        </p>
      )}
      {items.length > 0 && (
        <ul className="grid grid-cols-2 gap-4 sm:grid-cols-3 lg:grid-cols-4" aria-label={`Photos of ${clientName}`}>
          {items.map((photo) => (
            <li key={photo.id}>
              <button
                type="button"
                onClick={() => setViewing(photo)}
                className="group flex w-full flex-col gap-2 rounded-lg text-left"
              >
                <span className="flex aspect-[3/4] w-full items-center justify-center overflow-hidden rounded-lg border border-line bg-surface">
                  <img
                    src={photo.thumbUrl}
                    alt=""
                    width={photo.thumbWidth}
                    height={photo.thumbHeight}
                    loading="lazy"
                    className="h-full w-full object-cover transition-transform group-hover:scale-[1.02]"
                    data-testid="photo-thumb"
                  />
                </span>
                <span className="text-sm">
                  <span className="sr-only">Open at full size: </span>
                  <span className="font-semibold">{KIND_LABEL[photo.kind]}</span>
                  <span className="text-muted"> · {dayFormat(photo.takenOn)}</span>
                </span>
              </button>
            </li>
          ))}
        </ul>
      )}
      {canEdit && <PhotoUploadDialog open={adding} onClose={() => setAdding(false)} clientId={clientId} clientName={clientName} sets={sets} />}
      <PhotoViewer photo={viewing} clientId={clientId} canDelete={canEdit} onClose={() => setViewing(null)} />
    </Card>
  );
}
