import type { PropsWithChildren } from 'react';
import { ScrollViewStyleReset } from 'expo-router/html';
import { breakpoints, colors } from '@/constants/theme';

// The page background follows the system appearance before React starts, so there is no white flash.
// Every page is pre-rendered as a phone in light mode, shown at once there; a wider or dark screen keeps
// it hidden until React has redrawn it for that screen (app/_layout.tsx sets data-ready).
const background = `
body { background-color: ${colors.light.background}; }
@media (prefers-color-scheme: dark) { body { background-color: ${colors.dark.background}; } }
@media (min-width: ${breakpoints.medium}px), (prefers-color-scheme: dark) { #root:not([data-ready]) { visibility: hidden; } }
`;

/** The web document. The viewport keeps pinch-zoom on purpose: never add user-scalable=no. */
export default function Root({ children }: PropsWithChildren) {
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta httpEquiv="X-UA-Compatible" content="IE=edge" />
        <meta name="viewport" content="width=device-width, initial-scale=1, viewport-fit=cover" />
        <meta name="description" content="Ritorno: graded return to playing after a playing-related injury." />
        <meta name="theme-color" content={colors.light.background} />
        <ScrollViewStyleReset />
        <style dangerouslySetInnerHTML={{ __html: background }} />
      </head>
      <body>{children}</body>
    </html>
  );
}
