import { useSearchParams } from 'react-router-dom';
import { paths } from '../config/paths.js';

/** Where to go after signing in: the `next` query parameter when it is a path on this site. */
export function useNextPath(): string | undefined {
  const [params] = useSearchParams();
  return paths.signIn.parse(params).next;
}
