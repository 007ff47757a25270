import { type CreateClaimantRequest } from '@skyledger/contracts';

/**
 * Who made the demo claims. Every one is invented, as are their parties, businesses and
 * programmes; any likeness to a real person or body is unintended.
 */
export const claimants = {
  councillor: {
    name: 'Councillor Aldous Threlkeld',
    kind: 'public_figure',
    affiliation: 'Marrowby Borough Council (independent, Eastgate ward)',
    notes: 'Chairs the council’s transport committee. Invented for the demo.',
  },
  candidate: {
    name: 'Lorna Quennell',
    kind: 'public_figure',
    affiliation: 'Independent parliamentary candidate, Marrowby and Wenlow',
    notes: 'Invented for the demo.',
  },
  podcaster: {
    name: 'Rufus Kettleby',
    kind: 'public_figure',
    affiliation: 'Host of The Long Weather, a podcast and newsletter',
    notes: 'Invented for the demo.',
  },
  forum: {
    name: 'Wenlow Energy Forum',
    kind: 'organisation',
    affiliation: 'Trade association of heating-fuel distributors in Wenlow',
    notes:
      'Funded by its members; publishes press releases on energy policy. Invented for the demo.',
  },
  weatherClub: {
    name: 'Marrowby Weather Watchers',
    kind: 'organisation',
    affiliation: 'Amateur weather club, monthly newsletter',
    notes: 'Invented for the demo.',
  },
  resident: {
    name: 'Gareth Pennock',
    kind: 'private_individual',
    notes:
      'A Marrowby resident who wrote to the letters page. A private individual: not named on ' +
      'public pages unless the desk chief allows it. Invented for the demo.',
  },
} satisfies Record<string, CreateClaimantRequest>;
