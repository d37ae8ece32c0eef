import { useSearchParams } from 'react-router-dom';
import { NEXT_PARAM, safeNextPath } from '../../../app/paths';

/** The page to return to after signing in (from `?next=`), when it is a safe same-site path. */
export function useNextPath(): string | null {
  const [searchParams] = useSearchParams();
  return safeNextPath(searchParams.get(NEXT_PARAM));
}
