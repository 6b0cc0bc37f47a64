import { useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { Navigate, Outlet, useLocation, useNavigate } from 'react-router';
import { onUnauthorized } from '@/lib/api-client';
import { studioUnitDefaultSet } from '@/lib/unit';
import { authKeys } from '../api/auth-keys';
import { useMe } from '../api/get-me';
import { signInHrefFor } from '../lib/next-path';

/**
 * Wraps every signed-in screen. Its loader (`protectedLoader`) has already loaded the member;
 * here a session that ends later (signed out in another tab, expired, member disabled) sends
 * the member to sign-in with the way back.
 */
export function ProtectedLayout() {
  const me = useMe();
  const location = useLocation();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const unit = me.data?.studio.defaultUnit;

  useEffect(
    () =>
      onUnauthorized(() => {
        const here = `${window.location.pathname}${window.location.search}`;
        queryClient.clear();
        queryClient.setQueryData(authKeys.me(), null);
        void navigate(signInHrefFor(here), { replace: true });
      }),
    [navigate, queryClient],
  );

  useEffect(() => {
    if (unit) studioUnitDefaultSet(unit);
  }, [unit]);

  if (me.data === null) return <Navigate to={signInHrefFor(`${location.pathname}${location.search}`)} replace />;
  if (!me.data) return null;
  return <Outlet />;
}
