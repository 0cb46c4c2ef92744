/**
 * The workbench: header with the project title and tools, the cautions strip, the inputs
 * grouped as an installer works (span, wire, loads, installation, weather, limits) and the
 * results. It only wires components together; the solver runs in a worker. The client view
 * lives in the export menu.
 */
import { useEffect } from 'react';
import { setTitle } from '../state/projectEdits.ts';
import { useProjectStore } from '../state/projectStore.ts';
import { connectSolver } from '../worker/connectSolver.ts';
import { CautionsStrip } from './CautionsStrip.tsx';
import { ExportMenu } from './export/ExportMenu.tsx';
import { TextField } from './fields/TextField.tsx';
import { CasesPanel } from './panels/CasesPanel.tsx';
import { InstallationPanel } from './panels/InstallationPanel.tsx';
import { LimitsPanel } from './panels/LimitsPanel.tsx';
import { LoadsPanel } from './panels/LoadsPanel.tsx';
import { SpanPanel } from './panels/SpanPanel.tsx';
import { WirePanel } from './panels/WirePanel.tsx';
import { ResultsPane } from './ResultsPane.tsx';
import { Toolbar } from './Toolbar.tsx';
import { UpdateNotice } from './UpdateNotice.tsx';

function Inputs() {
  return (
    <section className="inputs" aria-label="Design inputs">
      <SpanPanel />
      <WirePanel />
      <LoadsPanel />
      <InstallationPanel />
      <CasesPanel />
      <LimitsPanel />
    </section>
  );
}

export function App() {
  useEffect(() => connectSolver(), []);
  const title = useProjectStore((s) => s.project.title);
  return (
    <div className="app">
      <header className="app-header">
        <h1>Sagwright</h1>
        <div className="project-title">
          <TextField path="title" label="Project title" value={title} edit={setTitle} />
        </div>
        <Toolbar />
        <ExportMenu />
      </header>
      <UpdateNotice />
      <CautionsStrip />
      <main className="layout-split">
        <Inputs />
        <ResultsPane />
      </main>
    </div>
  );
}
