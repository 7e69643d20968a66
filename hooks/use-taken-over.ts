import { startTransition, useEffect, useState } from 'react';

// Set once React has taken a server-drawn page over: components mounted after that start taken over.
let pageTakenOver = false;

/**
 * False while React takes over a server-drawn web page (and while the server draws it), true from the
 * render right after. What the server cannot know (a link's query string) must not change the first
 * render, or React throws the page away; show such things once this is true. The switch is a transition:
 * React draws it when the browser has time, not in the same task as taking the page over.
 */
export function useTakenOver(): boolean {
  const [takenOver, setTakenOver] = useState(pageTakenOver);
  useEffect(() => {
    pageTakenOver = true;
    if (!takenOver) startTransition(() => setTakenOver(true));
  }, [takenOver]);
  return takenOver;
}
