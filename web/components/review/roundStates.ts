import type { RoundState, Verdict } from '@web/services/reviews';

/** How each round state reads: a word and an icon, so colour is never the only signal. */
export const ROUND_STATES: Record<RoundState, { label: string; icon: string; severity: 'info' | 'warn' | 'success' | 'danger' | 'secondary' | 'contrast' }> = {
  open: { label: 'open', icon: 'pi pi-eye', severity: 'info' },
  'revise-requested': { label: 'revise requested', icon: 'pi pi-pencil', severity: 'warn' },
  endorsed: { label: 'endorsed', icon: 'pi pi-thumbs-up', severity: 'success' },
  adopted: { label: 'adopted', icon: 'pi pi-star-fill', severity: 'contrast' },
  declined: { label: 'declined', icon: 'pi pi-ban', severity: 'danger' },
  withdrawn: { label: 'withdrawn', icon: 'pi pi-undo', severity: 'secondary' },
};

export const VERDICTS: Record<Verdict, { label: string; icon: string; needsComment: boolean }> = {
  endorse: { label: 'Endorse', icon: 'pi pi-thumbs-up', needsComment: false },
  revise: { label: 'Revise', icon: 'pi pi-pencil', needsComment: true },
  decline: { label: 'Decline', icon: 'pi pi-ban', needsComment: true },
};

export const formatWhen = (iso: string) =>
  new Date(iso).toLocaleString('en-GB', { day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit', minute: '2-digit' });
