/**
 * The page the server drew is on screen before the app has started, and someone may scroll it while the
 * app draws its own copy. The copy replaces it at once, scrolled to the top: this keeps, per scrolled
 * element (a screen's scroll view, named by its test id), where it was scrolled to, and puts the copy
 * there. Web only.
 */
const offsets = new Map<string, { left: number; top: number }>();

function note(element: EventTarget | null): void {
  if (element instanceof HTMLElement && element.dataset.testid) {
    offsets.set(element.dataset.testid, { left: element.scrollLeft, top: element.scrollTop });
  }
}

const onScroll = (event: Event) => note(event.target);

/** Notes how far the server's page is scrolled now, and from now on (until `restorePreviewScroll`). */
export function followPreviewScroll(): void {
  for (const element of Array.from(document.querySelectorAll<HTMLElement>('#root [data-testid]'))) {
    if (element.scrollTop > 0 || element.scrollLeft > 0) note(element);
  }
  document.addEventListener('scroll', onScroll, { capture: true, passive: true });
}

/**
 * Scrolls the app's copy of the page where its server-drawn preview was left, and stops noting. A copy
 * not yet in place, or not yet as tall, is tried again on the next frames (for about a second).
 */
export function restorePreviewScroll(root: ParentNode = document, frames = 60): void {
  document.removeEventListener('scroll', onScroll, { capture: true });
  const pending = new Map(offsets);
  offsets.clear();
  const attempt = (framesLeft: number) => {
    for (const [testId, { left, top }] of pending) {
      const element = root.querySelector<HTMLElement>(`[data-testid="${CSS.escape(testId)}"]`);
      if (element && element.scrollHeight - element.clientHeight >= top) {
        // Set directly: react-native-web puts its own scrollTo({ x, y }) on a scroll view's element.
        element.scrollLeft = left;
        element.scrollTop = top;
        pending.delete(testId);
      }
    }
    if (pending.size > 0 && framesLeft > 0) requestAnimationFrame(() => attempt(framesLeft - 1));
  };
  attempt(frames);
}
