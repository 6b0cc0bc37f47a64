import { DRAFT_TRANSITIONS, TRANSITION_ROLES, type DraftStateChange } from '../../shared/schemas/draft.js';
import type { DraftDto } from '../../shared/schemas/draft-dto.js';
import { Forbidden, Invalid } from '../lib/errors.js';
import { Draft } from '../models/index.js';
import type { ServiceContext } from './context.js';
import { fabricRead } from './draft-records.js';
import { draftDto, draftFind, revisionFind } from './draft-view.js';
import { reopenRevisionWrite, STALE_DRAFT } from './drafts.js';
import { versionCheck, versionedWrite, WriteConflict } from './versioned.js';

const MOVE_WORDS: Record<DraftStateChange['to'], string> = {
  drafting: 'reopened',
  approved: 'approved',
  cut: 'marked cut',
  sewn: 'marked sewn',
  delivered: 'marked delivered',
};

/**
 * Moves a draft along drafting → approved → cut → sewn → delivered, or reopens an approved
 * draft. Approving keeps the engine version of the revision approved; reopening writes a new
 * revision drawn by the current engine. A role that may not make the move answers 403; a move
 * the state does not allow, or a stale version, 409 with the draft as it now is.
 */
export async function draftMove(c: ServiceContext, id: number, move: DraftStateChange): Promise<DraftDto> {
  return versionedWrite(
    Draft.sequelize!,
    async (transaction) => {
      const draft = await draftFind(c, id, transaction, true);
      if (!TRANSITION_ROLES[move.to].includes(c.role)) {
        throw new Forbidden(move.to === 'approved' || move.to === 'drafting' ? 'Only an owner can approve or reopen a draft.' : undefined);
      }
      versionCheck(draft, move.version);
      if (!DRAFT_TRANSITIONS[draft.state].includes(move.to)) {
        throw new WriteConflict(`A draft that is ${draft.state} cannot be ${MOVE_WORDS[move.to]}.`);
      }
      const now = new Date();
      const note = move.note || null;
      switch (move.to) {
        case 'approved': {
          const revision = await revisionFind(c, draft.id, draft.revision, transaction);
          draft.set({
            approvedRevision: revision.number,
            approvedEngineVersion: revision.engineVersion,
            approvedAt: now,
            approvedBy: c.userId,
          });
          break;
        }
        case 'drafting':
          draft.set({ approvedRevision: null, approvedEngineVersion: null, approvedAt: null, approvedBy: null });
          break;
        case 'cut': {
          const fabric = await fabricRead(c, move.fabricId, transaction);
          if (!fabric) throw new Invalid('Some fields need attention.', { fabricId: 'No such fabric in this studio' });
          draft.set({ cutAt: now, cutBy: c.userId, cutFabricId: fabric.id, cutNote: note });
          break;
        }
        case 'sewn':
          draft.set({ sewnAt: now, sewnBy: c.userId, sewnNote: note });
          break;
        case 'delivered':
          draft.set({ deliveredAt: now, deliveredBy: c.userId, deliveredNote: note });
          break;
      }
      draft.set({ state: move.to, stateChangedAt: now });
      if (move.to === 'drafting') return draftDto(c, draft, transaction, await reopenRevisionWrite(c, draft, transaction));
      await draft.save({ transaction });
      return draftDto(c, draft, transaction);
    },
    { message: STALE_DRAFT, current: async () => draftDto(c, await draftFind(c, id)) },
  );
}
