import type { MeResponse } from '@shared/schemas/auth';
import { useMe } from '../api/get-me';

/**
 * The signed-in member on a screen inside the protected layout, which renders its screens
 * only once `me` is loaded and not null.
 */
export function useMember(): MeResponse {
  const { data } = useMe();
  if (!data) throw new Error('useMember is used outside the signed-in screens.');
  return data;
}

/** True for the studio's owners: they run the team and the studio's defaults. */
export function isOwner(me: MeResponse | null | undefined): boolean {
  return me?.user.role === 'owner';
}
