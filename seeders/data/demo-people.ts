// The invented demo scenario: Orrinvale Site Imaging, a fictional capture firm in the
// fictional city of Maraskell. Every person, address and claim in the seeders is made up.
import type { Role } from '../../shared/roles';

export const DEMO_PASSWORD = 'sightline-demo';
export const DEMO_DOMAIN = 'orrinvale.test';

export type DemoPerson = { name: string; email: string; role: Role };

const person = (name: string, role: Role): DemoPerson => ({
  name,
  role,
  email: `${name.split(' ')[0].toLowerCase()}.${name.split(' ').slice(-1)[0].toLowerCase()}@${DEMO_DOMAIN}`,
});

export const DEMO_PEOPLE: DemoPerson[] = [
  person('Tess Okafor', 'technician'),
  person('Jonah Brightwater', 'technician'),
  person('Priya Vantongeren', 'technician'),
  person('Mateo Quillfeather', 'technician'),
  person('Wren Halvorsen', 'technician'),
  person('Dario Lund', 'technician'),
  person('Ravi Lindqvist', 'reviewer'),
  person('Hana Osterhout', 'reviewer'),
  person('Felix Achterberg', 'reviewer'),
  person('Mara Delacroix', 'manager'),
  person('Alex Brandt', 'admin'),
];
