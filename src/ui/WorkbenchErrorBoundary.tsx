/**
 * If drawing the workbench fails, the page does not go blank: the project lives in the store
 * (and its autosave) outside React, so this says what happened, offers the project as a file and
 * lets the person try to draw the workbench again.
 */
import { Component, type ErrorInfo, type ReactNode } from 'react';
import { useProjectStore } from '../state/projectStore.ts';
import { downloadProject } from './SessionNotices.tsx';

interface State {
  error: Error | null;
}

export class WorkbenchErrorBoundary extends Component<{ children: ReactNode }, State> {
  override state: State = { error: null };

  static getDerivedStateFromError(error: unknown): State {
    return { error: error instanceof Error ? error : new Error(String(error)) };
  }

  override componentDidCatch(error: Error, info: ErrorInfo): void {
    console.error('Sagwright could not draw the workbench', error, info.componentStack);
  }

  override render() {
    const { error } = this.state;
    if (!error) return this.props.children;
    const title = useProjectStore.getState().project.title;
    return (
      <main className="workbench-fault session-notice notice-error" role="alert">
        <h1>Sagwright</h1>
        <p>
          Something went wrong while drawing the workbench ({error.message.slice(0, 200)}). Your
          project “{title}” is safe: it is kept in this tab and in this browser's autosave.
        </p>
        <div className="actions">
          <button type="button" onClick={() => downloadProject(useProjectStore.getState().project)}>
            Download the project
          </button>
          <button type="button" onClick={() => this.setState({ error: null })}>
            Try again
          </button>
        </div>
      </main>
    );
  }
}
