import { describe, expect, expectTypeOf, it } from 'vitest';
import type { CatalogueEntry as ServerEntry } from '@api/catalogue/catalogue.schemas';
import type { AttachmentMeta } from '@api/attachments/attachments.schemas';
import type { CapturedMail as ServerMail } from '@api/mail/inbox.schemas';
import type { Remark as ServerRemark, RoundDetail as ServerRoundDetail } from '@api/reviews/reviews.schemas';
import type { SetDetail as ServerSetDetail } from '@api/sets/sets.schemas';
import type { Attachment } from '@web/services/attachments';
import type { CatalogueEntry } from '@web/services/catalogue';
import type { CapturedMail } from '@web/services/inbox';
import type { Jsonified } from '@web/services/jsonified';
import type { Remark, RoundDetail } from '@web/services/reviews';
import type { SetDetail } from '@web/services/sets';

/** What the wire does to a server value: the JSON the web parses. */
const overTheWire = <T>(value: T) => JSON.parse(JSON.stringify(value)) as Jsonified<T>;

describe('Jsonified', () => {
  it('turns dates into strings at any depth and leaves everything else as it is', () => {
    type Server = { at: Date; maybe: Date | null; list: { when: Date; n: number }[]; nested: { tags: readonly string[] } };
    expectTypeOf<Jsonified<Server>>().toEqualTypeOf<{ at: string; maybe: string | null; list: { when: string; n: number }[]; nested: { tags: string[] } }>();
    const sent: Server = { at: new Date('2026-11-20T10:00:00Z'), maybe: null, list: [{ when: new Date('2026-11-21T08:30:00Z'), n: 2 }], nested: { tags: ['surface'] } };
    expect(overTheWire(sent)).toEqual({ at: '2026-11-20T10:00:00.000Z', maybe: null, list: [{ when: '2026-11-21T08:30:00.000Z', n: 2 }], nested: { tags: ['surface'] } });
  });

  // Checked by the type-check (vue-tsc) of `npm test`: a hand copy that drifts from the server fails there.
  it('gives the web the server\'s own catalogue, attachment, inbox, set and review shapes with string dates', () => {
    expectTypeOf<CatalogueEntry>().toEqualTypeOf<Jsonified<ServerEntry>>();
    expectTypeOf<CatalogueEntry['updatedAt']>().toEqualTypeOf<string>();
    expectTypeOf<CatalogueEntry['structure']>().toEqualTypeOf<Jsonified<ServerEntry['structure']>>();
    expectTypeOf<Attachment['createdAt']>().toEqualTypeOf<string>();
    expectTypeOf<Attachment>().toEqualTypeOf<Jsonified<AttachmentMeta>>();
    expectTypeOf<CapturedMail['receivedAt']>().toEqualTypeOf<string>();
    expectTypeOf<CapturedMail>().toEqualTypeOf<Jsonified<ServerMail>>();
    expectTypeOf<SetDetail>().toEqualTypeOf<Jsonified<ServerSetDetail>>();
    expectTypeOf<SetDetail['createdAt']>().toEqualTypeOf<string>();
    expectTypeOf<Remark>().toEqualTypeOf<Jsonified<ServerRemark>>();
    expectTypeOf<Remark['replies'][number]['createdAt']>().toEqualTypeOf<string>();
    expectTypeOf<RoundDetail>().toEqualTypeOf<Jsonified<ServerRoundDetail>>();
    expectTypeOf<RoundDetail['closedAt']>().toEqualTypeOf<string | null>();
    expectTypeOf<RoundDetail['timeline'][number]['details']>().toEqualTypeOf<{ [key: string]: unknown }>();
  });
});
