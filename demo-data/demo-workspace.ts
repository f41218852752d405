import type { Role } from '../api/src/workspaces/workspaces-dto';

// An invented company and invented people for the demo workspace. Any likeness to a real firm
// is accidental.

export interface DemoPerson {
  email: string;
  displayName: string;
  role: Role;
  /** What they do, in the words of PRODUCT.md's role table. */
  job: string;
}

export const demoPassword = 'cradle-demo-2026';

export const demoWorkspace = {
  // A fixed id makes reloading the demo find the same workspace instead of adding another.
  id: '7a3e0c52-4d1b-4f2e-9a6c-0de1c0a1e001',
  name: 'Tarnholm Instruments — FP-7 charging cradle',
  company: 'Tarnholm Instruments (invented)',
  story:
    'Tarnholm makes handheld soil and water probes for field surveys. The FP-7 probe drops ' +
    'into a charging cradle in the survey van; the team must keep charging working when the ' +
    'probe sits up to 4 mm off-centre and tilted in a muddy cradle.',
};

export const demoPeople: DemoPerson[] = [
  {
    email: 'ines.varga@tarnholm.example',
    displayName: 'Ines Varga',
    role: 'owner',
    job: 'Project lead for the FP-7 cradle',
  },
  {
    email: 'oskar.brandt@tarnholm.example',
    displayName: 'Oskar Brandt',
    role: 'editor',
    job: 'Power-electronics engineer',
  },
  {
    email: 'mira.achebe@tarnholm.example',
    displayName: 'Mira Achebe',
    role: 'reviewer',
    job: 'Design-review member',
  },
  {
    email: 'tomas.lindqvist@tarnholm.example',
    displayName: 'Tomas Lindqvist',
    role: 'viewer',
    job: 'Mechanical designer of the cradle housing',
  },
];
