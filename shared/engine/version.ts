/**
 * Version of the drafting engine. Stored with every approved draft so that a draft can be
 * re-drafted identically or flagged when the engine's results change: bump the minor number
 * when the same input gives different geometry or figures, the patch number otherwise.
 */
export const ENGINE_VERSION = '1.0.0';
