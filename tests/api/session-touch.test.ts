import { Store, type SessionData } from 'express-session';
import { describe, expect, it } from 'vitest';
import { throttleTouch } from '@api/auth/session-touch';

/** A store whose touches are held until the test answers them, so "the response waits" would show. */
class HeldTouchStore extends Store {
  readonly held: { sid: string; answer: (error?: unknown) => void }[] = [];
  get = () => undefined;
  set = () => undefined;
  destroy = () => undefined;
  override touch = (sid: string, _session: SessionData, done?: (error?: unknown) => void) => {
    this.held.push({ sid, answer: (error) => done?.(error) });
  };
}

const session = { cookie: { originalMaxAge: 1000 } } as SessionData;

function touched(store: Store, sid: string): boolean {
  let answered = false;
  store.touch!(sid, session, () => (answered = true));
  return answered;
}

describe('throttleTouch', () => {
  it('answers at once, before the store has written the new expiry', () => {
    const store = new HeldTouchStore();
    throttleTouch(store, 60_000, () => 0);
    expect(touched(store, 'a')).toBe(true);
    expect(store.held.map((touch) => touch.sid)).toEqual(['a']);
  });

  it('writes each session’s expiry at most once per interval', () => {
    const store = new HeldTouchStore();
    let time = 0;
    throttleTouch(store, 60_000, () => time);
    touched(store, 'a');
    time = 59_999;
    touched(store, 'a');
    touched(store, 'b');
    expect(store.held.map((touch) => touch.sid)).toEqual(['a', 'b']);
    time = 60_000;
    touched(store, 'a');
    expect(store.held.map((touch) => touch.sid)).toEqual(['a', 'b', 'a']);
  });

  it('tries again at the next request when a write failed', () => {
    const store = new HeldTouchStore();
    throttleTouch(store, 60_000, () => 0);
    touched(store, 'a');
    store.held[0].answer(new Error('connection lost'));
    touched(store, 'a');
    expect(store.held.map((touch) => touch.sid)).toEqual(['a', 'a']);
  });
});
