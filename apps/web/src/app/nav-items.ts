import { roles, type Role } from '@skyledger/contracts';
import { paths } from '@/config/paths';

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
  { id: 'people', label: 'People', to: paths.app.people.getHref(), roles: ['desk_chief'] },
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
