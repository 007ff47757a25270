import { demoDocument, demoScreenshot } from '../captures/demo-captures';

/**
 * Archived captures of where the demo claims appeared: drawn by the seed, each marked as
 * a demo capture. The same newsletter capture serves two claims, so the desk shows one
 * stored file for identical bytes.
 */
export const captures = {
  councilWebcast: demoScreenshot({
    name: 'council-webcast-2026-11-12.png',
    platform: 'MARROWBY COUNCIL WEBCAST',
    byline: 'TRANSPORT COMMITTEE - ITEM 6',
    text:
      'CLLR THRELKELD: Everybody forgets the planet has a molten core. That heat is coming ' +
      'up through the ground, and that is what is warming us, not the cars on the bypass.',
    seen: '2026-11-12 19:42',
    accent: [36, 92, 72],
  }),
  newsletterPost: demoScreenshot({
    name: 'the-long-weather-2026-11-19.png',
    platform: 'THE LONG WEATHER',
    byline: 'RUFUS KETTLEBY - NEWSLETTER',
    text:
      'Warming stopped in 2016. Nine years, no new record worth the name. Nobody wants to ' +
      'talk about 2016 because it ruins the story.',
    seen: '2026-11-19 07:05',
    accent: [74, 60, 140],
  }),
  podcastPage: demoScreenshot({
    name: 'the-long-weather-episode-114.png',
    platform: 'THE LONG WEATHER',
    byline: 'EPISODE 114 - THE STATION',
    text:
      'The Marrowby station keeper has been nudging the readings up for years. That is your ' +
      'warming: one volunteer and a pencil.',
    seen: '2026-11-25 20:30',
    accent: [74, 60, 140],
  }),
  forumRelease: demoDocument({
    name: 'wenlow-energy-forum-press-release.pdf',
    heading: 'The sun, not your boiler, is warming Wenlow',
    from: 'Wenlow Energy Forum - press office',
    date: '13 November 2026',
    paragraphs: [
      'The sun is brighter than it has been for centuries, and that is the simple reason ' +
        'our summers are warmer. Households should not be made to pay for new heating ' +
        'systems to fix something the sun is doing.',
      'Notes to editors: the Forum represents heating-fuel distributors across Wenlow.',
    ],
  }),
  residentLetter: demoDocument({
    name: 'letter-to-the-editor-2026-11-20.pdf',
    heading: 'Letter to the editor',
    from: 'Letters page, Marrowby Gazette (name withheld on request)',
    date: '20 November 2026',
    paragraphs: [
      'Carbon dioxide is four hundredths of one per cent of the air. I do not see how ' +
        'something so small can change the weather of a whole planet, and I would like ' +
        'the Gazette to explain it to me.',
    ],
  }),
};
