import type { QueueCounts, Role } from '@web/services/types';

/** One place of the header's navigation: a named route, with the number waiting there for queues. */
export interface HeaderLink {
  name: string;
  label: string;
  icon: string;
  /** Set for the queues only: `data-queue` names them for tests and styles. */
  queue: boolean;
  count: number | null;
}

/**
 * The header's links for a person: everyone's pages, Import for authors, the queues only for the
 * roles that work them (the server still checks every request). The same list feeds the row of
 * links on wide windows and the folded menu on narrow ones.
 */
export function headerLinksFor(hasRole: (role: Role) => boolean, counts: QueueCounts | null): HeaderLink[] {
  const page = (name: string, label: string, icon: string): HeaderLink => ({ name, label, icon, queue: false, count: null });
  const queue = (name: string, label: string, icon: string, count: number | null | undefined): HeaderLink => ({
    name, label, icon, queue: true, count: count ?? null,
  });
  return [
    page('library', 'Library', 'pi pi-book'),
    page('catalogue', 'Catalogue', 'pi pi-table'),
    page('sets', 'Sets', 'pi pi-clone'),
    ...(hasRole('author') ? [page('import', 'Import', 'pi pi-upload')] : []),
    ...(hasRole('reviewer') ? [queue('my-reviews', 'My reviews', 'pi pi-check-square', counts?.myReviews)] : []),
    ...(hasRole('curator') ? [queue('to-adopt', 'To adopt', 'pi pi-bookmark', counts?.toAdopt)] : []),
  ];
}
