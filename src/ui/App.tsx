/**
 * The workbench: header with the project title and tools, the cautions strip, the inputs
 * grouped as an installer works (span, wire, loads, installation, weather, limits) and the
 * results. It only wires components together; the solver runs in a worker. The client view
 * lives in the export menu.
 */
import { useEffect } from 'react';
import { appSession } from '../state/appSession.ts';
import { setTitle } from '../state/projectEdits.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { useSessionStore } from '../state/sessionStore.ts';
import { CautionsStrip } from './CautionsStrip.tsx';
import { ExportMenu } from './export/ExportMenu.tsx';
import { TextField } from './fields/TextField.tsx';
import { InputSections } from './InputSections.tsx';
import { ResultsPane } from './ResultsPane.tsx';
import { SessionNotices } from './SessionNotices.tsx';
import { Toolbar } from './Toolbar.tsx';
import { UpdateNotice } from './UpdateNotice.tsx';

function Inputs({ locked }: { locked: boolean }) {
  return (
    <section className="inputs" aria-label="Design inputs" inert={locked}>
      <InputSections />
    </section>
  );
}

/** Coming back to this tab: another tab may have taken the project meanwhile. */
function useOwnerCheck() {
  useEffect(() => {
    const check = () => document.visibilityState === 'visible' && appSession()?.checkOwner();
    document.addEventListener('visibilitychange', check);
    window.addEventListener('focus', check);
    return () => {
      document.removeEventListener('visibilitychange', check);
      window.removeEventListener('focus', check);
    };
  }, []);
}

export function App() {
  useOwnerCheck();
  const title = useProjectStore((s) => s.project.title);
  const locked = useSessionStore((s) => s.otherTabEditing);
  return (
    <div className="app">
      <header className="app-header">
        <h1>Sagwright</h1>
        <div className="project-title" inert={locked}>
          <TextField path="title" label="Project title" value={title} edit={setTitle} />
        </div>
        <Toolbar />
        <ExportMenu />
      </header>
      <UpdateNotice />
      <CautionsStrip />
      <SessionNotices />
      <main className="layout-split">
        <Inputs locked={locked} />
        <ResultsPane />
      </main>
    </div>
  );
}
