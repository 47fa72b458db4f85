import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { App } from './app/app';
import './index.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html must contain <div id="root"></div> for the app to mount into.');

createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
