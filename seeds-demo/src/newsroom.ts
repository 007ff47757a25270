import { type Role } from '@skyledger/contracts';

export interface DemoPerson {
  email: string;
  displayName: string;
  role: Role;
}

/**
 * The demo newsroom: the science desk of the Marrowby Gazette, a regional paper that
 * does not exist. Every name here is invented.
 */
export const newsroom = {
  outlet: 'Marrowby Gazette',
  /** Demo only: printed by `npm start`, never used outside the demo seed. */
  password: 'skyledger-demo',
  people: [
    { email: 'chief@marrowby-gazette.test', displayName: 'Morwenna Hale', role: 'desk_chief' },
    { email: 'editor@marrowby-gazette.test', displayName: 'Tamsin Ferrow', role: 'science_editor' },
    { email: 'copy@marrowby-gazette.test', displayName: 'Declan Ashby', role: 'copy_desk' },
    { email: 'reporter@marrowby-gazette.test', displayName: 'Priya Lindqvist', role: 'reporter' },
  ] satisfies DemoPerson[],
} as const;
