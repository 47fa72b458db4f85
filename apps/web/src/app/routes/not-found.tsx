import { NotFound } from '../../components/errors/not-found';

/** Any address no route matches. */
export default function NotFoundRoute() {
  return <NotFound />;
}
