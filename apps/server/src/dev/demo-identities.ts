import type { UserRole } from '../entities/user.entity';

/** A person the local sign-in provider offers; invented, for the demo and the tests only. */
export interface DemoIdentity {
  githubId: number;
  login: string;
  name: string;
  email: string;
  role: UserRole;
  about: string;
}

/** The members of an invented research group and an invented joinery workshop that plans assemblies. */
export const demoIdentities: readonly DemoIdentity[] = [
  { githubId: 7100001, login: 'ines-marlow', name: 'Inès Marlow', email: 'ines@tollgate-lattice.example', role: 'admin', about: 'runs the Tollgate lattice group' },
  { githubId: 7100002, login: 'tobias-quell', name: 'Tobias Quell', email: 'tobias@tollgate-lattice.example', role: 'researcher', about: 'tabulates grid rank numbers' },
  { githubId: 7100003, login: 'wren-adeyemi', name: 'Wren Adeyemi', email: 'wren@brackwater-joinery.example', role: 'researcher', about: 'plans parallel assembly at Brackwater Joinery' },
  { githubId: 7100004, login: 'guest-reader', name: 'Guest Reader', email: 'guest@tollgate-lattice.example', role: 'viewer', about: 'reads public runs and the atlas' },
];
