import type { PropsWithChildren } from 'react';
import { ScrollViewStyleReset, useServerDocumentContext } from 'expo-router/html';
import { breakpoints, colors } from '@/constants/theme';

// The server draws every page when it is asked for (server/middleware/web-export.ts), for a phone in
// light mode, with the data its visitor's first draw needs; expo-router hands this document the page's
// styles and scripts (headNodes, bodyNodes).
// The page background follows the system appearance before React starts, so there is no white flash.
// A phone in light mode shows the drawn page at once; a wider or dark screen keeps
// it hidden until React has redrawn it for that screen (app/_layout.tsx sets data-ready).
const background = `
body { background-color: ${colors.light.background}; }
@media (prefers-color-scheme: dark) { body { background-color: ${colors.dark.background}; } }
@media (min-width: ${breakpoints.medium}px), (prefers-color-scheme: dark) { #root:not([data-ready]) { visibility: hidden; } }
`;

/** The web document. The viewport keeps pinch-zoom on purpose: never add user-scalable=no. */
export default function Root({ children }: PropsWithChildren) {
  const { headNodes, bodyNodes } = useServerDocumentContext();
  return (
    <html lang="en">
      <head>
        <meta charSet="utf-8" />
        <meta httpEquiv="X-UA-Compatible" content="IE=edge" />
        <meta name="viewport" content="width=device-width, initial-scale=1, viewport-fit=cover" />
        <meta name="description" content="Ritorno: graded return to playing after a playing-related injury." />
        <meta name="theme-color" content={colors.light.background} />
        <ScrollViewStyleReset />
        <title>Ritorno</title>
        <style dangerouslySetInnerHTML={{ __html: background }} />
        {headNodes}
      </head>
      <body>
        {children}
        {bodyNodes}
      </body>
    </html>
  );
}
