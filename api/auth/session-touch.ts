import type { Store } from 'express-session';

/** How often a signed-in person's activity moves their session's expiry on in the table. */
export const TOUCH_EVERY_MS = 60_000;

// Past this many remembered sessions, those not touched within the interval are forgotten.
const REMEMBERED_SESSIONS = 10_000;

/**
 * Rolling sessions move the expiry on with every request, and express-session holds back the
 * last byte of each response until the store has done so: with PostgreSQL that is a committed
 * UPDATE per request, on the path of every answer (the workbench asks for an analysis at each
 * pause in typing). Here the expiry is written at most once per interval per session, and no
 * response waits for it. A write that fails is tried again at the next request after the interval;
 * the session lasts 14 days, so being a minute behind never signs anyone out.
 */
export function throttleTouch(store: Store, everyMs = TOUCH_EVERY_MS, now: () => number = Date.now): void {
  if (!store.touch) return;
  const write = store.touch.bind(store);
  const lastWritten = new Map<string, number>();

  store.touch = (sid, session, done) => {
    done?.();
    const time = now();
    if (time - (lastWritten.get(sid) ?? -Infinity) < everyMs) return;
    if (lastWritten.size >= REMEMBERED_SESSIONS) forgetOlderThan(lastWritten, time - everyMs);
    lastWritten.set(sid, time);
    write(sid, session, (error?: unknown) => {
      if (error) lastWritten.delete(sid);
    });
  };
}

function forgetOlderThan(lastWritten: Map<string, number>, cutoff: number): void {
  for (const [sid, time] of lastWritten) if (time < cutoff) lastWritten.delete(sid);
}
