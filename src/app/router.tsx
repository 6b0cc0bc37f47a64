import { createBrowserRouter } from 'react-router';
import { paths } from '@/config/paths';
import { RootLayout } from './routes/root-layout';
import { RouteError } from './routes/route-error';

/** One lazy module per screen keeps the first load small. */
export const router = createBrowserRouter([
  {
    element: <RootLayout />,
    errorElement: <RouteError />,
    children: [
      { path: paths.home.path, lazy: () => import('./routes/home').then((m) => ({ Component: m.HomeRoute })) },
      { path: '*', lazy: () => import('./routes/not-found').then((m) => ({ Component: m.NotFoundRoute })) },
    ],
  },
]);
