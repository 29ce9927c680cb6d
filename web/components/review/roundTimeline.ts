import type { RoundDetail, RoundEvent } from '@web/services/reviews';
import { ROUND_STATES } from './roundStates';

export interface TimelineLine {
  id: number;
  icon: string;
  text: string;
  createdAt: string;
}

type Describe = (event: RoundEvent, name: (id: unknown) => string) => { icon: string; text: string };

const stateWord = (value: unknown) => ROUND_STATES[value as keyof typeof ROUND_STATES]?.label ?? String(value);
const count = (value: unknown) => (Array.isArray(value) ? value.length : 0);

const DESCRIPTIONS: Record<string, Describe> = {
  'round.opened': (e, name) => ({ icon: 'pi pi-flag', text: `${name(e.actorId)} opened the round on r${e.details.revision}` }),
  'round.reviewer-assigned': (e, name) => ({ icon: 'pi pi-user-plus', text: `${name(e.actorId)} assigned ${name(e.details.reviewerId)} as reviewer` }),
  'verdict.given': (e, name) => ({ icon: 'pi pi-check-square', text: `${name(e.actorId)} gave the verdict “${e.details.verdict}” on r${e.details.revision}` }),
  'round.state-changed': (e, name) => ({
    icon: 'pi pi-arrow-right',
    text: `${name(e.actorId)} moved the round from ${stateWord(e.details.from)} to ${stateWord(e.details.to)}${e.details.reason ? ` (${e.details.reason})` : ''}`,
  }),
  'round.revision-entered': (e, name) => ({ icon: 'pi pi-history', text: `${name(e.actorId)} saved r${e.details.revision}; it entered the round` }),
  'remarks.followed': (e) => ({
    icon: 'pi pi-link',
    text: `Remarks followed into r${e.details.revision}: ${count(e.details.moved)} moved, ${count(e.details.noLongerMatching)} no longer matching`,
  }),
  'remark.created': (e, name) => ({ icon: 'pi pi-comment', text: `${name(e.actorId)} remarked on step ${e.details.step} of r${e.details.revision}` }),
  'remark.replied': (e, name) => ({ icon: 'pi pi-reply', text: `${name(e.actorId)} replied to a remark` }),
  'remark.settled': (e, name) => ({ icon: 'pi pi-check', text: `${name(e.actorId)} settled a remark` }),
};

/** Every name the round itself reveals: reviewers and verdict givers. */
export function namesIn(round: RoundDetail): Map<number, string> {
  const names = new Map<number, string>();
  for (const reviewer of round.reviewers) names.set(reviewer.id, reviewer.name);
  for (const verdict of round.verdicts) names.set(verdict.reviewerId, verdict.reviewerName);
  return names;
}

/** The round's audit log as sentences: who did what, oldest first. */
export function describeTimeline(events: readonly RoundEvent[], names: ReadonlyMap<number, string>): TimelineLine[] {
  const name = (id: unknown) => (typeof id === 'number' ? (names.get(id) ?? `person #${id}`) : 'Someone');
  return events.map((event) => {
    const describe = DESCRIPTIONS[event.action];
    const { icon, text } = describe ? describe(event, name) : { icon: 'pi pi-circle', text: `${name(event.actorId)}: ${event.action}` };
    return { id: event.id, icon, text, createdAt: event.createdAt };
  });
}
