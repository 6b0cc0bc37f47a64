import { redirect, type LoaderFunctionArgs } from 'react-router';
import { queryClient } from '@/lib/query-client';
import { meQueryOptions } from '../api/get-me';
import { nextPathSafe, signInHrefFor } from './next-path';

/** Loader of every signed-in screen: loads `me`, or sends the visitor to sign-in and back. */
export async function protectedLoader({ request }: LoaderFunctionArgs) {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (!me) {
    const url = new URL(request.url);
    throw redirect(signInHrefFor(`${url.pathname}${url.search}`));
  }
  return null;
}

/** Loader of sign-in and sign-up: a member who is already signed in goes on to the page asked for. */
export async function signedOutLoader({ request }: LoaderFunctionArgs) {
  const me = await queryClient.ensureQueryData(meQueryOptions());
  if (me) throw redirect(nextPathSafe(new URL(request.url).searchParams.get('next')));
  return null;
}
