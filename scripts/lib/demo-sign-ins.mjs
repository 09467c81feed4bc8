// The demo sign-ins printed by `npm start`; kept in step with db/seed/demo.ts by a unit test.
export const DEMO_PASSWORD = 'keybed-demo';
export const DEMO_MEMBERS = [
  { email: 'margaret@fennick.example', role: 'owner' },
  { email: 'tom@fennick.example', role: 'foreman' },
  { email: 'priya@fennick.example', role: 'technician' },
  { email: 'declan@fennick.example', role: 'technician' },
  { email: 'ana@fennick.example', role: 'technician' },
];
