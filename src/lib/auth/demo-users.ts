import type { Role } from './roles';

/** One person of each role at Brindlewood Creamery (demo mode only; production refuses them). */
export interface DemoUser {
  id: string;
  role: Role;
  name: string;
  email: string;
  password: string;
  /** What they do at the plant. */
  job: string;
}

export const DEMO_USERS: readonly DemoUser[] = [
  { id: 'demo-reader', role: 'reader', name: 'Priya Halloran', email: 'priya.halloran@brindlewood.example', password: 'silo-reader-2026', job: 'Graduate controls technician, first month on site' },
  { id: 'demo-author', role: 'author', name: 'Marek Lindqvist', email: 'marek.lindqvist@brindlewood.example', password: 'htst-author-2026', job: 'Senior controls engineer, pasteurizer and CIP' },
  { id: 'demo-curator', role: 'curator', name: 'Odile Brennan', email: 'odile.brennan@brindlewood.example', password: 'glycol-curator-2026', job: 'Lead process-control engineer, keeps the recipe book' },
  { id: 'demo-admin', role: 'admin', name: 'Tobiah Quarrie', email: 'tobiah.quarrie@brindlewood.example', password: 'boiler-admin-2026', job: 'Automation systems administrator' },
];
