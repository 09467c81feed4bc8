import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { AppProviders } from '@/app/providers';
import '@/styles/app.css';

const container = document.getElementById('root');
if (!container) throw new Error('index.html must contain <div id="root">');

createRoot(container).render(
  <StrictMode>
    <AppProviders />
  </StrictMode>,
);
