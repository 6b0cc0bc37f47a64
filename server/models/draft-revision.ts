import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { DraftInput } from '../../shared/schemas/draft-input.js';
import {
  REVISION_KINDS,
  type DraftChange,
  type DraftComputed,
  type DraftSnapshot,
  type RevisionKind,
} from '../../shared/schemas/draft-dto.js';
import { jsonText } from './json-text.js';

/**
 * One saved state of a draft, never changed once written: what was saved, by whom, what
 * changed, the engine input built from it and the engine's numbers with the engine version.
 */
export class DraftRevision extends Model<InferAttributes<DraftRevision>, InferCreationAttributes<DraftRevision>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare draftId: number;
  declare number: number;
  declare kind: RevisionKind;
  declare restoredFrom: number | null;
  declare userId: number | null;
  declare snapshot: DraftSnapshot;
  declare changes: DraftChange[];
  declare input: DraftInput;
  declare computed: DraftComputed;
  declare engineVersion: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    DraftRevision.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        draftId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.ENUM(...REVISION_KINDS), allowNull: false },
        restoredFrom: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
        snapshot: jsonText<DraftRevision>('snapshot'),
        changes: jsonText<DraftRevision>('changes'),
        input: jsonText<DraftRevision>('input'),
        computed: jsonText<DraftRevision>('computed'),
        engineVersion: { type: DataTypes.STRING(32), allowNull: false },
        createdAt: DataTypes.DATE(3),
      },
      { sequelize, tableName: 'draft_revisions', updatedAt: false },
    );
  }
}
