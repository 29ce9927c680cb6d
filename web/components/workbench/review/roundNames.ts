import type { MechanismSummary } from '@web/services/mechanisms';
import type { Person, Remark, RoundDetail } from '@web/services/reviews';
import { namesIn } from '@web/components/review/roundTimeline';

/** Every person the workbench knows by name, for the round's timeline (the audit log holds only ids). */
export function roundNames(
  round: RoundDetail | null,
  mechanism: MechanismSummary | null,
  remarks: readonly Remark[],
  curators: readonly Person[],
): Map<number, string> {
  const names = round ? namesIn(round) : new Map<number, string>();
  const add = (id: number, name: string | null) => {
    if (name) names.set(id, name);
  };
  for (const person of curators) add(person.id, person.name);
  if (mechanism) [mechanism.owner, ...mechanism.collaborators].forEach((p) => add(p.id, p.name));
  for (const remark of remarks) {
    add(remark.authorId, remark.authorName);
    remark.replies.forEach((reply) => add(reply.authorId, reply.authorName));
  }
  return names;
}
