/**
 * App shell: the product name, the demo project's title, a small results table, the sag plot
 * and the safety cautions. It solves the demo project once on the main thread; the worker,
 * store and full workbench replace this wiring later.
 */
import { useMemo } from 'react';
import { CAUTION_SUMMARY, CAUTIONS, solveProject } from '../core/index.ts';
import type { CaseResult, Project, ProjectResults } from '../core/project.ts';
import { demoProject } from '../state/demoProject.ts';
import { SagPlot } from './SagPlot.tsx';

type SolveOutcome = { ok: true; results: ProjectResults } | { ok: false; message: string };

function solveSafely(project: Project): SolveOutcome {
  try {
    return { ok: true, results: solveProject(project) };
  } catch (error) {
    return { ok: false, message: error instanceof Error ? error.message : String(error) };
  }
}

const newtons = new Intl.NumberFormat('en', { maximumFractionDigits: 0 });
const metres = new Intl.NumberFormat('en', { minimumFractionDigits: 3, maximumFractionDigits: 3 });

function ResultsTable({ cases }: { cases: CaseResult[] }) {
  return (
    <table aria-label="Results by case">
      <thead>
        <tr>
          <th scope="col">Case</th>
          <th scope="col">Horizontal tension (N)</th>
          <th scope="col">Largest tension (N)</th>
          <th scope="col">Sag (m)</th>
        </tr>
      </thead>
      <tbody>
        {cases.map((result) => (
          <tr key={result.name}>
            <th scope="row">{result.name}</th>
            <td>{newtons.format(result.horizontalTension)}</td>
            <td>{newtons.format(result.maxTension)}</td>
            <td>{metres.format(result.sag)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

function Cautions() {
  return (
    <section className="cautions" aria-label="Cautions">
      <p>
        <strong>Caution:</strong> {CAUTION_SUMMARY}
      </p>
      <details>
        <summary>All cautions</summary>
        <ul>
          {CAUTIONS.map((caution) => (
            <li key={caution.title}>
              <strong>{caution.title}.</strong> {caution.text}
            </li>
          ))}
        </ul>
      </details>
    </section>
  );
}

export function App() {
  const outcome = useMemo(() => solveSafely(demoProject), []);
  return (
    <div className="app">
      <header>
        <h1>Sagwright</h1>
        <h2>{demoProject.title}</h2>
      </header>
      <Cautions />
      <main>
        {outcome.ok ? (
          <>
            <ResultsTable cases={outcome.results.cases} />
            <SagPlot project={demoProject} cases={outcome.results.cases} />
          </>
        ) : (
          <p role="alert">The project could not be solved: {outcome.message}</p>
        )}
      </main>
    </div>
  );
}
