import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import './styles.css';
import { App } from './app/App';

const root = document.getElementById('root');
if (!root) throw new Error('index.html lacks #root');
createRoot(root).render(
  <StrictMode>
    <App />
  </StrictMode>,
);
