import { roles, type Role } from '@skyledger/contracts';
import { paths } from '@/config/paths';
import { claimRoles } from '@/features/claims/claim-permissions';

export interface NavItem {
  id: string;
  label: string;
  to: string;
  /** The roles that see the item and may open its page. */
  roles: readonly Role[];
}

/** The one table of the desk's navigation; later screens add their row here. */
export const navItems = [
  { id: 'desk', label: 'Desk', to: paths.app.desk.getHref(), roles },
  { id: 'queue', label: 'Claims', to: paths.app.queue.getHref(), roles },
  {
    id: 'awaiting-signoff',
    label: 'Awaiting sign-off',
    to: paths.app.queue.getHref('status=awaiting_signoff'),
    roles: ['copy_desk', 'desk_chief'],
  },
  {
    // Cleared claims, scheduled or still to publish: no queue filter tells the two apart.
    id: 'cleared',
    label: 'Cleared to publish',
    to: paths.app.queue.getHref('status=cleared'),
    roles: ['copy_desk', 'desk_chief'],
  },
  {
    id: 'file-claim',
    label: 'File a claim',
    to: paths.app.fileClaim.getHref(),
    roles: claimRoles.contribute,
  },
  { id: 'search', label: 'Search', to: paths.app.search.getHref(), roles },
  { id: 'datasets', label: 'Datasets', to: paths.app.datasets.getHref(), roles },
  { id: 'workbench', label: 'Workbench', to: paths.app.workbench.getHref(), roles },
  { id: 'rating-scale', label: 'Rating scale', to: paths.app.ratingScale.getHref(), roles },
  { id: 'people', label: 'People', to: paths.app.people.getHref(), roles: ['desk_chief'] },
  { id: 'outbox', label: 'Outbox', to: paths.app.outbox.getHref(), roles: ['desk_chief'] },
  { id: 'audit', label: 'Audit trail', to: paths.app.audit.getHref(), roles: ['desk_chief'] },
  { id: 'account', label: 'Account', to: paths.app.account.getHref(), roles },
] as const satisfies readonly NavItem[];

export type NavItemId = (typeof navItems)[number]['id'];

export function navItemsFor(role: Role): readonly NavItem[] {
  return navItems.filter((item) => (item.roles as readonly Role[]).includes(role));
}

export function navItem(id: NavItemId): NavItem {
  const item = navItems.find((candidate) => candidate.id === id);
  if (!item) throw new Error(`No navigation item ${id}`);
  return item;
}

export function mayOpen(role: Role, id: NavItemId): boolean {
  return (navItem(id).roles as readonly Role[]).includes(role);
}
