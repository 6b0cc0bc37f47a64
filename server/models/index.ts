import type { Sequelize } from 'sequelize';
import { Session } from './session.js';
import { Studio } from './studio.js';
import { User } from './user.js';
import { Block } from './block.js';
import { BlockCorrection } from './block-correction.js';
import { Draft } from './draft.js';
import { DraftRevision } from './draft-revision.js';
import { Style } from './style.js';
import { Client } from './client.js';
import { Fabric } from './fabric.js';
import { MeasurementSet } from './measurement-set.js';
import { Photo } from './photo.js';
import { Swatch } from './swatch.js';
import { Delivery } from './delivery.js';
import { Invitation } from './invitation.js';
import { PasswordReset } from './password-reset.js';
import { SentMessage } from './sent-message.js';
import { SentMessageAttachment } from './sent-message-attachment.js';

export { Session, Studio, User };
export { Block, BlockCorrection, Draft, DraftRevision, Style };
export { Client, Fabric, MeasurementSet };
export { Photo, Swatch };
export { Delivery, Invitation, PasswordReset, SentMessage, SentMessageAttachment };

/** Registers every model and its associations on one Sequelize instance. */
export function modelsInit(sequelize: Sequelize): void {
  Studio.initModel(sequelize);
  User.initModel(sequelize);
  Session.initModel(sequelize);
  Client.initModel(sequelize);
  MeasurementSet.initModel(sequelize);
  Fabric.initModel(sequelize);
  Photo.initModel(sequelize);
  Swatch.initModel(sequelize);
  Block.initModel(sequelize);
  BlockCorrection.initModel(sequelize);
  Style.initModel(sequelize);
  Draft.initModel(sequelize);
  DraftRevision.initModel(sequelize);
  Invitation.initModel(sequelize);
  PasswordReset.initModel(sequelize);
  Delivery.initModel(sequelize);
  SentMessage.initModel(sequelize);
  SentMessageAttachment.initModel(sequelize);

  Studio.hasMany(User, { foreignKey: 'studioId', as: 'members' });
  User.belongsTo(Studio, { foreignKey: 'studioId', as: 'studio' });
  Block.hasMany(BlockCorrection, { foreignKey: 'blockId', as: 'corrections' });
}
