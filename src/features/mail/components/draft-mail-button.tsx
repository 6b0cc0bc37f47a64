import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { DraftMailDialog, type MailClient, type MailDocuments } from './draft-mail-dialog';

export interface DraftMailButtonProps {
  draftId: number;
  /** "Marisol Venn, Scoop tank": the dialog's title after "E-mail". */
  title: string;
  revision: number;
  /** True while the workspace shows changes not saved yet (the PDF is made from what is saved). */
  unsaved: boolean;
  owner: boolean;
  client: MailClient;
  studioPaper: string;
  documents: MailDocuments;
}

/** Opens the dialog that e-mails a draft's tiled pages, wide sheet or ticket. */
export function DraftMailButton({ draftId, title, revision, unsaved, owner, client, studioPaper, documents }: DraftMailButtonProps) {
  const [open, setOpen] = useState(false);
  // Mounted on the first click and then kept, so the choices made stay for the next send.
  const [opened, setOpened] = useState(false);
  return (
    <>
      <Button
        compact
        aria-haspopup="dialog"
        onClick={() => {
          setOpened(true);
          setOpen(true);
        }}
      >
        E-mail…
      </Button>
      {opened && (
        <DraftMailDialog
          open={open}
          onClose={() => setOpen(false)}
          draftId={draftId}
          title={title}
          revision={revision}
          unsaved={unsaved}
          owner={owner}
          client={client}
          studioPaper={studioPaper}
          documents={documents}
        />
      )}
    </>
  );
}
