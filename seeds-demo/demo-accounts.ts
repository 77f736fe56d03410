/** The demo sign-ins, one per role; every one uses the same demo password (shown in README and by npm start). */
export const DEMO_PASSWORD = 'kelvindex-demo';

export interface DemoAccount {
  email: string;
  name: string;
  roles: ('reader' | 'steward' | 'reviewer' | 'editor' | 'admin')[];
}

// Invented people of the invented company in the demo scenario.
export const DEMO_ACCOUNTS: DemoAccount[] = [
  { email: 'reader@kelvindex.test', name: 'Rosa Lindqvist', roles: ['reader'] },
  { email: 'steward@kelvindex.test', name: 'Tomasz Okafor', roles: ['reader', 'steward'] },
  { email: 'reviewer@kelvindex.test', name: 'Ines Marchetti', roles: ['reader', 'reviewer'] },
  { email: 'reviewer2@kelvindex.test', name: 'Kwame Haldane', roles: ['reader', 'reviewer'] },
  { email: 'editor@kelvindex.test', name: 'Priya Vasquez', roles: ['reader', 'editor'] },
  { email: 'admin@kelvindex.test', name: 'Jonas Ferreira', roles: ['reader', 'admin'] },
];
