/**
 * Browser entry: starts the session (autosave, other tabs, solver and design workers) and mounts the
 * workbench into #root (which shows a loading line until then).
 */
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { hasSharedProject } from './deliverables/shareLink.ts';
import { startAppSession } from './state/appSession.ts';
import { App } from './ui/App.tsx';
import { WorkbenchErrorBoundary } from './ui/WorkbenchErrorBoundary.tsx';
import { createDesignWorker, createSolverWorker } from './worker/createSolverWorker.ts';
import './shell.css';
import './ui/workbench.css';
// After the workbench's own rules, so the phone and tablet rules win where they overlap.
import './ui/smallScreens.css';

const container = document.getElementById('root');
if (!container) throw new Error('index.html has no #root element');

// A shared project in the address is shown without writing over the person's own autosave.
startAppSession(createSolverWorker, hasSharedProject(location.hash), createDesignWorker);

createRoot(container).render(
  <StrictMode>
    <WorkbenchErrorBoundary>
      <App />
    </WorkbenchErrorBoundary>
  </StrictMode>,
);
