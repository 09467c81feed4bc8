/**
 * The invented demo scenario (shared/SCENARIO.md): Fennick Cross Piano Works and its people.
 * Fixed ids keep the seed idempotent: a second run finds every row and changes nothing.
 */
export const DEMO_PASSWORD = 'keybed-demo';

export const DEMO_WORKSHOP = {
  id: '0b1d6c2e-5a4f-4c8e-9a51-7f3e2d1c0a01',
  name: 'Fennick Cross Piano Works',
  currency: 'GBP',
  timeZone: 'Europe/London',
} as const;

export const DEMO_MEMBERS = [
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a01', email: 'margaret@fennick.example', name: 'Margaret Oyelaran', role: 'owner' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a02', email: 'tom@fennick.example', name: 'Tom Albright', role: 'foreman' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a03', email: 'priya@fennick.example', name: 'Priya Natarajan', role: 'technician' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a04', email: 'declan@fennick.example', name: 'Declan Moss', role: 'technician' },
  { id: '1f6a0e52-3b9c-4d71-8e2a-0c5b7d9e1a05', email: 'ana@fennick.example', name: 'Ana Sousa', role: 'technician' },
] as const;
