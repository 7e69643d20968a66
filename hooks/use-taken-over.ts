import { useSyncExternalStore } from 'react';

const noSubscription = () => () => undefined;

/**
 * False while React takes over a pre-rendered web page (and during pre-rendering), true from the render
 * right after. What the pre-rendering cannot know (a link's query string, the screen's width) must not
 * change the first render, or React throws the page away; show such things once this is true.
 */
export function useTakenOver(): boolean {
  return useSyncExternalStore(noSubscription, () => true, () => false);
}
