import type { Role } from '../users/users.schemas';

/** The invented Saltmarsh Atmospheric & Catalysis Network: one account per role (and a second reviewer). */
export const DEMO_PASSWORD = 'saltmarsh-demo-2026';

export interface DemoPerson {
  name: string;
  email: string;
  roles: Role[];
  note: string;
}

export const DEMO_PEOPLE: DemoPerson[] = [
  { name: 'Rosalind Samphire', email: 'rosalind.samphire@saltmarsh.example.test', roles: ['author'], note: 'field station, bromine release' },
  { name: 'Kofi Glasswort', email: 'kofi.glasswort@saltmarsh.example.test', roles: ['reviewer'], note: 'catalysis group' },
  { name: 'Mei Tidewell', email: 'mei.tidewell@saltmarsh.example.test', roles: ['reviewer', 'author'], note: 'catalysis group' },
  { name: 'Anouk Spartina', email: 'anouk.spartina@saltmarsh.example.test', roles: ['curator'], note: 'network curator' },
  { name: 'Bram Sedge', email: 'bram.sedge@saltmarsh.example.test', roles: ['instructor'], note: 'teaching unit' },
  { name: 'Ines Marram', email: 'ines.marram@saltmarsh.example.test', roles: ['admin'], note: 'accounts' },
];
