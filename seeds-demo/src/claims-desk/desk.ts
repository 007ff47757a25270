import { type Role } from '@skyledger/contracts';
import { newsroom } from '../newsroom';

function emailOf(role: Role): string {
  const person = newsroom.people.find((candidate) => candidate.role === role);
  if (!person) throw new Error(`The demo newsroom has no ${role}`);
  return person.email;
}

/** The e-mails of the demo desk, by what they do (one person per role). */
export const desk = {
  chief: emailOf('desk_chief'),
  editor: emailOf('science_editor'),
  copy: emailOf('copy_desk'),
  reporter: emailOf('reporter'),
};
