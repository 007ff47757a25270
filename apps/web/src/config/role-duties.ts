import type { Role } from '@skyledger/contracts';

export interface RoleDuties {
  /** One line on who holds the role, e.g. as a hint when choosing it. */
  summary: string;
  /** The same, said to the person who holds it. */
  youDo: string;
  /** What the role may do on the desk, in the desk's own words. */
  mayDo: readonly string[];
}

export const roleDuties: Record<Role, RoleDuties> = {
  reporter: {
    summary: 'Brings in the claims met on the beat.',
    youDo: 'you bring in the claims you meet on your beat',
    mayDo: [
      'File a claim you came across, as it was said',
      'Add where it appeared, sources and attachments to any claim',
      'Comment on claims',
      'Read everything on the desk',
    ],
  },
  science_editor: {
    summary: 'Researches claims and checks them against the evidence.',
    youDo: 'you research claims and check them against the evidence',
    mayDo: [
      'Everything a reporter may do',
      'Take a claim to research, or be given one',
      'Run workings with the desk calculators',
      'Draft verdicts and explainers, and send them for sign-off',
    ],
  },
  copy_desk: {
    summary: 'Holds the standards and signs off what gets published.',
    youDo: 'you hold the standards and sign off what gets published',
    mayDo: [
      'Read everything on the desk',
      'Edit the copy of explainers',
      'Sign off or send back a verdict someone else drafted',
      'Publish an explainer now, or schedule it',
    ],
  },
  desk_chief: {
    summary: 'Runs the desk: its people, its rating scale and its sign-offs.',
    youDo: 'you run the desk: its people, its rating scale and its sign-offs',
    mayDo: [
      'Everything the other roles may do',
      'Invite people, change their roles and disable accounts',
      'Keep the rating scale and assign claims',
      'Set claims aside, and sign off verdicts you did not draft',
    ],
  },
};
