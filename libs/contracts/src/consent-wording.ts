// No zod here: the owner page's first screen shows this wording without loading the schema library.

/**
 * The consent wording, kept in code with a version id so every recorded
 * consent points at the exact words the owner saw. Change the text → bump the
 * version; old consents keep their version. Our own wording.
 */
export const CONSENT_WORDING = {
  version: 'marketing-photos-v1',
  title: 'May we show your bike in our marketing?',
  paragraphs: [
    'We would like to use some before-and-after photos from this visit on our website, in our shop and on social media, to show the kind of work we do.',
    'Only photos of the bike and its parts are used. No people, faces, number plates, addresses or other personal details appear: we crop or blur anything like that before use.',
    'Your name is never shown. You choose below whether the bike’s make and model may be named.',
    'You can withdraw this consent at any time on this page or by asking the shop. We then stop using the photos straight away in anything we publish from then on.',
  ],
  makeModelLabel: 'The make and model of my bike may be named',
} as const;
