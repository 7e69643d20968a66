import type { Role } from '../../shared/schemas/role';

/**
 * The invented demo: Harbourside Conservatory's spring showcase, the Linden Street clinic that
 * serves its students, two clinicians, four musicians and two teachers. All names are made up.
 */
export const DEMO_PASSWORD = 'ritorno-demo-2026';

interface DemoPerson {
  key: string;
  role: Role;
  name: string;
  email: string;
}

interface DemoMusician {
  person: string;
  clinician: string;
  instrument: string;
  sharedWith: string[];
}

export function demoScenario(_now: Date): { people: DemoPerson[]; musicians: DemoMusician[] } {
  const people: DemoPerson[] = [
    { key: 'admin', role: 'admin', name: 'Rita Admin', email: 'admin@ritorno.example' },
    { key: 'oakley', role: 'clinician', name: 'Dr Maren Oakley', email: 'maren.oakley@linden-clinic.example' },
    { key: 'reyne', role: 'clinician', name: 'Tomas Reyne', email: 'tomas.reyne@linden-clinic.example' },
    { key: 'varga', role: 'musician', name: 'Ilse Varga', email: 'ilse.varga@harbourside.example' },
    { key: 'brandt', role: 'musician', name: 'Caio Brandt', email: 'caio.brandt@harbourside.example' },
    { key: 'haddad', role: 'musician', name: 'Noor Haddad', email: 'noor.haddad@harbourside.example' },
    { key: 'amsel', role: 'musician', name: 'Felix Amsel', email: 'felix.amsel@harbourside.example' },
    { key: 'whitlow', role: 'teacher', name: 'Agnes Whitlow', email: 'agnes.whitlow@harbourside.example' },
    { key: 'lenz', role: 'teacher', name: 'Dario Lenz', email: 'dario.lenz@harbourside.example' },
  ];
  const musicians: DemoMusician[] = [
    { person: 'varga', clinician: 'oakley', instrument: 'Violin', sharedWith: ['whitlow'] },
    { person: 'brandt', clinician: 'oakley', instrument: 'Clarinet', sharedWith: ['lenz'] },
    { person: 'haddad', clinician: 'oakley', instrument: 'Piano', sharedWith: ['whitlow', 'lenz'] },
    { person: 'amsel', clinician: 'reyne', instrument: 'Cello', sharedWith: ['whitlow'] },
  ];
  return { people, musicians };
}
