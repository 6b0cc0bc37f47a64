import type { DestroyOptions } from 'sequelize';
import { Client, Fabric, Photo, Swatch } from '../models/index.js';
import { imageFilesDelete, type UploadDeps } from './image-files.js';

const HOOK = 'stored-image-files';
const pending = new WeakMap<object, string[]>();

/**
 * Deleting a client or a fabric removes its photo or swatch rows through the database's
 * CASCADE; these hooks remove their stored files too, once the delete has committed (or at
 * once when it ran outside a transaction). A rolled-back delete keeps every file.
 * Named hooks: registering again (a second app in one process) replaces the first.
 */
export function recordCleanupRegister(deps: UploadDeps): void {
  const collect = async (instance: object, keys: Promise<string[]>) => {
    pending.set(instance, await keys);
  };
  const release = (instance: object, options: DestroyOptions) => {
    const keys = pending.get(instance) ?? [];
    pending.delete(instance);
    if (keys.length === 0) return;
    const remove = () => void imageFilesDelete(deps, keys);
    if (options.transaction) options.transaction.afterCommit(remove);
    else remove();
  };

  Client.removeHook('beforeDestroy', HOOK);
  Client.removeHook('afterDestroy', HOOK);
  Client.addHook('beforeDestroy', HOOK, (client: Client, options: DestroyOptions) =>
    collect(
      client,
      Photo.findAll({ where: { clientId: client.id }, transaction: options.transaction }).then((rows) => rows.flatMap((p) => [p.fullKey, p.thumbKey])),
    ),
  );
  Client.addHook('afterDestroy', HOOK, (client: Client, options: DestroyOptions) => release(client, options));

  Fabric.removeHook('beforeDestroy', HOOK);
  Fabric.removeHook('afterDestroy', HOOK);
  Fabric.addHook('beforeDestroy', HOOK, (fabric: Fabric, options: DestroyOptions) =>
    collect(
      fabric,
      Swatch.findAll({ where: { fabricId: fabric.id }, transaction: options.transaction }).then((rows) => rows.flatMap((s) => [s.fullKey, s.thumbKey])),
    ),
  );
  Fabric.addHook('afterDestroy', HOOK, (fabric: Fabric, options: DestroyOptions) => release(fabric, options));
}
