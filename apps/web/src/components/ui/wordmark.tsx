import { Link as RouterLink } from 'react-router-dom';
import { paths } from '@/config/paths';

/** The name in type, always a way home to the desk. */
export function Wordmark() {
  return (
    <RouterLink to={paths.app.desk.getHref()} className="sl-wordmark">
      Skyledger
    </RouterLink>
  );
}
