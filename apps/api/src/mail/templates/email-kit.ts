import type { ReactElement } from 'react';

/** What the templates draw with: react-email's components and React's static renderer. */
export type EmailKit = typeof import('@react-email/html') &
  typeof import('@react-email/head') &
  typeof import('@react-email/preview') &
  typeof import('@react-email/body') &
  typeof import('@react-email/container') &
  typeof import('@react-email/section') &
  typeof import('@react-email/text') &
  typeof import('@react-email/button') &
  typeof import('@react-email/row') &
  typeof import('@react-email/column') &
  Pick<typeof import('react-dom/server'), 'renderToStaticMarkup'>;

let kit: EmailKit | undefined;

/**
 * Loaded on the first message, not at boot: react-dom/server and the components add about 12 MB of
 * resident memory (measured with process.memoryUsage on Node 20) that an idle API does not carry.
 * Loaded with require, synchronously, because a message is rendered inside the synchronous SQLite
 * transaction of its cause (the link minted, the payment recorded), so the row commits with it.
 * For the same reason the HTML is drawn by React's synchronous renderToStaticMarkup: @react-email/render
 * only offers an async render (a stream), which cannot run inside such a transaction.
 */
export function emailKit(): EmailKit {
  /* eslint-disable @typescript-eslint/no-require-imports -- lazy and synchronous on purpose, see above */
  kit ??= {
    ...(require('@react-email/html') as typeof import('@react-email/html')),
    ...(require('@react-email/head') as typeof import('@react-email/head')),
    ...(require('@react-email/preview') as typeof import('@react-email/preview')),
    ...(require('@react-email/body') as typeof import('@react-email/body')),
    ...(require('@react-email/container') as typeof import('@react-email/container')),
    ...(require('@react-email/section') as typeof import('@react-email/section')),
    ...(require('@react-email/text') as typeof import('@react-email/text')),
    ...(require('@react-email/button') as typeof import('@react-email/button')),
    ...(require('@react-email/row') as typeof import('@react-email/row')),
    ...(require('@react-email/column') as typeof import('@react-email/column')),
    renderToStaticMarkup: (require('react-dom/server') as typeof import('react-dom/server')).renderToStaticMarkup,
  };
  /* eslint-enable @typescript-eslint/no-require-imports */
  return kit;
}

/** True once a message has been rendered in this process (the boot-memory test checks it is false after start). */
export const emailKitLoaded = (): boolean => kit !== undefined;

/** One whole HTML document; React escapes every text and attribute value it writes. */
export const renderHtml = (element: ReactElement): string => `<!DOCTYPE html>${emailKit().renderToStaticMarkup(element)}`;
