import { useState } from 'react';
import { PHOTO_KINDS, photoFieldsSchema, type PhotoKind } from '@shared/schemas/photo';
import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Dialog } from '@/components/ui/dialog';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';
import { ApiError } from '@/lib/api-client';
import { useUploadPhoto } from '../api/upload-photo';
import { KIND_LABEL, dayFormat, todayLocal } from '../lib/photo-labels';
import { ImageDropzone } from './image-dropzone';
import { UploadProgress } from './upload-progress';

/** A measurement set the photo may go with, as the client page lists them. */
export interface PhotoSetOption {
  setId: number;
  takenAt: string;
}

export interface PhotoUploadDialogProps {
  open: boolean;
  onClose: () => void;
  clientId: number;
  clientName: string;
  sets: PhotoSetOption[];
}

/** Adds one fitting photo: the image, which view it shows, its date and the fitting it goes with. */
export function PhotoUploadDialog({ open, onClose, clientId, clientName, sets }: PhotoUploadDialogProps) {
  const [file, setFile] = useState<File | null>(null);
  const [kind, setKind] = useState<PhotoKind>('front');
  const [takenOn, setTakenOn] = useState(todayLocal);
  const [setId, setSetId] = useState(sets[0] ? String(sets[0].setId) : '');
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const upload = useUploadPhoto(clientId, { onSuccess: () => close(true) });

  function close(done = false) {
    if (upload.isPending && !done) return;
    setFile(null);
    setFieldErrors({});
    upload.reset();
    onClose();
  }

  function submit() {
    const fields = { kind, takenOn, measurementSetId: setId };
    const parsed = photoFieldsSchema.safeParse(fields);
    const errors: Record<string, string> = {};
    if (!parsed.success) for (const issue of parsed.error.issues) errors[String(issue.path[0] ?? '_')] ??= issue.message;
    if (!file) errors.photo = 'Choose a photo to upload.';
    setFieldErrors(errors);
    if (Object.keys(errors).length > 0 || !file) return;
    upload.mutate({ file, fields }, { onError: (error) => setFieldErrors(error instanceof ApiError ? error.fields : {}) });
  }

  const generalError = upload.error && Object.keys(fieldErrors).length === 0 ? upload.error.message : null;

  return (
    <Dialog
      open={open}
      onClose={() => close()}
      title={`Add a fitting photo of ${clientName}`}
      className="max-w-xl!"
      footer={
        <>
          <Button onClick={() => close()} disabled={upload.isPending}>
            Cancel
          </Button>
          <Button variant="primary" onClick={submit} pending={upload.isPending} pendingLabel="Uploading…">
            Upload photo
          </Button>
        </>
      }
    >
      <form
        className="flex flex-col gap-4"
        noValidate
        onSubmit={(event) => {
          event.preventDefault();
          submit();
        }}
      >
        <ImageDropzone what="fitting photo" file={file} onFile={setFile} error={fieldErrors.photo} disabled={upload.isPending} />
        <div className="grid gap-4 sm:grid-cols-2">
          <SelectField
            label="View"
            value={kind}
            onChange={(e) => setKind(e.target.value as PhotoKind)}
            options={PHOTO_KINDS.map((k) => ({ value: k, label: KIND_LABEL[k] }))}
            error={fieldErrors.kind}
            disabled={upload.isPending}
          />
          <TextField
            label="Date taken"
            type="date"
            value={takenOn}
            max={todayLocal()}
            onChange={(e) => setTakenOn(e.target.value)}
            error={fieldErrors.takenOn}
            disabled={upload.isPending}
          />
        </div>
        <SelectField
          label="Goes with the fitting"
          optional
          value={setId}
          onChange={(e) => setSetId(e.target.value)}
          options={[{ value: '', label: 'None' }, ...sets.map((s) => ({ value: String(s.setId), label: `Measurements of ${dayFormat(s.takenAt)}` }))]}
          error={fieldErrors.measurementSetId}
          hint={sets.length === 0 ? 'No measurement sets yet: the photo is kept on its own.' : undefined}
          disabled={upload.isPending}
        />
        {upload.progress !== null && <UploadProgress fraction={upload.progress} />}
        {generalError && <Alert tone="error" title="The photo was not saved">{generalError}</Alert>}
        <button type="submit" hidden tabIndex={-1} aria-hidden="true" />
      </form>
    </Dialog>
  );
}
