import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import { DRAFT_STATES, type DraftState } from '../../shared/schemas/draft.js';
import type { ParamsMm } from '../../shared/schemas/style.js';
import { jsonText } from './json-text.js';

/**
 * One style drafted for one block with one fabric. The columns hold the draft as last saved;
 * every save also writes a draft_revisions row with the engine's numbers.
 */
export class Draft extends Model<InferAttributes<Draft>, InferCreationAttributes<Draft>> {
  declare id: CreationOptional<number>;
  declare studioId: number;
  declare clientId: number;
  declare blockId: number;
  declare styleId: number;
  declare fabricId: number;
  /** The unit the engine's input is written in: the studio's unit when the draft was started. */
  declare unit: 'in' | 'cm';
  declare params: ParamsMm;
  declare dueOn: string | null;
  declare notes: string;
  declare state: DraftState;
  declare stateChangedAt: Date;
  /** The number of the newest revision. */
  declare revision: number;
  declare approvedRevision: number | null;
  declare approvedEngineVersion: string | null;
  declare approvedAt: Date | null;
  declare approvedBy: number | null;
  declare cutAt: Date | null;
  declare cutBy: number | null;
  declare cutFabricId: number | null;
  declare cutNote: string | null;
  declare sewnAt: Date | null;
  declare sewnBy: number | null;
  declare sewnNote: string | null;
  declare deliveredAt: Date | null;
  declare deliveredBy: number | null;
  declare deliveredNote: string | null;
  declare createdBy: number | null;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    // Fresh objects per attribute: Sequelize writes into each definition it is given.
    const id = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: false });
    const optionalId = () => ({ type: DataTypes.INTEGER.UNSIGNED, allowNull: true });
    const when = () => ({ type: DataTypes.DATE(3), allowNull: true });
    const note = () => ({ type: DataTypes.STRING(1000), allowNull: true });
    Draft.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        studioId: id(),
        clientId: id(),
        blockId: id(),
        styleId: id(),
        fabricId: id(),
        unit: { type: DataTypes.ENUM('in', 'cm'), allowNull: false },
        params: jsonText<Draft>('params'),
        dueOn: { type: DataTypes.DATEONLY, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false },
        state: { type: DataTypes.ENUM(...DRAFT_STATES), allowNull: false, defaultValue: 'drafting' },
        stateChangedAt: { type: DataTypes.DATE(3), allowNull: false },
        revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        approvedRevision: optionalId(),
        approvedEngineVersion: { type: DataTypes.STRING(32), allowNull: true },
        approvedAt: when(),
        approvedBy: optionalId(),
        cutAt: when(),
        cutBy: optionalId(),
        cutFabricId: optionalId(),
        cutNote: note(),
        sewnAt: when(),
        sewnBy: optionalId(),
        sewnNote: note(),
        deliveredAt: when(),
        deliveredBy: optionalId(),
        deliveredNote: note(),
        createdBy: optionalId(),
        version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'drafts', version: true },
    );
  }
}
