import { Op } from 'sequelize';
import type { QueueItemDto } from '../../shared/schemas/draft-dto.js';
import { Draft, DraftRevision, Style } from '../models/index.js';
import type { ServiceContext } from './context.js';
import { clientNames, fabricNames } from './draft-records.js';

/**
 * The work queue: drafts in one state (approved, waiting to be cut, by default), oldest first
 * by when they entered it, with what the cutter needs to pick the next one.
 */
export async function queueList(c: ServiceContext, state: 'approved' | 'cut' | 'sewn'): Promise<{ items: QueueItemDto[] }> {
  const drafts = await Draft.findAll({ where: { studioId: c.studioId, state }, order: [['stateChangedAt', 'ASC'], ['id', 'ASC']] });
  if (drafts.length === 0) return { items: [] };
  const revisions = await DraftRevision.findAll({
    where: { studioId: c.studioId, [Op.or]: drafts.map((d) => ({ draftId: d.id, number: d.revision })) },
    attributes: ['draftId', 'number', 'computed', 'engineVersion'],
  });
  const byDraft = new Map(revisions.map((r) => [`${r.draftId}:${r.number}`, r]));
  const clients = await clientNames(c, drafts.map((d) => d.clientId));
  const fabrics = await fabricNames(c, drafts.map((d) => d.fabricId));
  const styles = new Map(
    (await Style.findAll({ where: { studioId: c.studioId, id: [...new Set(drafts.map((d) => d.styleId))] } })).map((s) => [s.id, s.name]),
  );
  return {
    items: drafts.map((d) => {
      const rev = byDraft.get(`${d.id}:${d.revision}`);
      if (!rev) throw new Error(`draft ${d.id}: revision ${d.revision} is missing`);
      return {
        id: d.id,
        state: d.state,
        client: { id: d.clientId, name: clients.get(d.clientId) ?? '' },
        style: { id: d.styleId, name: styles.get(d.styleId) ?? '' },
        fabric: { id: d.fabricId, name: fabrics.get(d.fabricId) ?? '' },
        dueOn: d.dueOn,
        since: d.stateChangedAt.toISOString(),
        revision: d.revision,
        engineVersion: rev.engineVersion,
        lengthNeeded: rev.computed.layout.lengthNeeded,
        fold: rev.computed.layout.fold,
        warnings: rev.computed.warnings.length,
        version: d.version,
      };
    }),
  };
}
