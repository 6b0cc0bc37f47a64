import { useState } from 'react';
import type { PhotoView } from '@shared/schemas/photo';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { useDeletePhoto } from '../api/delete-photo';
import { KIND_LABEL, bytesFormat, dayFormat } from '../lib/photo-labels';

export interface PhotoViewerProps {
  photo: PhotoView | null;
  clientId: number;
  canDelete: boolean;
  onClose: () => void;
}

export function photoAlt(photo: PhotoView): string {
  return `${KIND_LABEL[photo.kind]} view, ${dayFormat(photo.takenOn)}`;
}

/** One photo at full size in a modal dialog, with its details; owners may delete it after a second click. */
export function PhotoViewer({ photo, clientId, canDelete, onClose }: PhotoViewerProps) {
  const [confirming, setConfirming] = useState(false);
  const remove = useDeletePhoto(clientId, { onSuccess: () => close() });

  function close() {
    setConfirming(false);
    remove.reset();
    onClose();
  }

  return (
    <Dialog
      open={photo !== null}
      onClose={close}
      title={photo ? photoAlt(photo) : ''}
      className="max-w-4xl!"
      description={
        photo && (
          <span className="num">
            {photo.width} × {photo.height} px · {bytesFormat(photo.bytes)} · added by {photo.uploadedBy.name}
          </span>
        )
      }
      footer={
        <>
          {canDelete && !confirming && (
            <Button variant="ghost" onClick={() => setConfirming(true)}>
              Delete photo
            </Button>
          )}
          {canDelete && confirming && (
            <Button variant="danger" onClick={() => photo && remove.mutate(photo.id)} pending={remove.isPending} pendingLabel="Deleting…">
              Delete this photo for good
            </Button>
          )}
          <Button variant="primary" onClick={close}>
            Close
          </Button>
        </>
      }
    >
      {photo && (
        <div className="flex flex-col gap-3">
          <img
            src={photo.fullUrl}
            alt={photoAlt(photo)}
            width={photo.width}
            height={photo.height}
            className="mx-auto h-auto max-h-[65vh] w-auto max-w-full rounded-md bg-surface object-contain"
            data-testid="photo-full"
          />
          {remove.isError && <Alert tone="error" title="Not deleted">{remove.error.message}</Alert>}
        </div>
      )}
    </Dialog>
  );
}
