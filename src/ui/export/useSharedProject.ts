/**
 * Opening a share link: the link is cleared from the address first (so a link that hurts the
 * page cannot do so again on reload), the shared project is shown and the session's autosave is
 * paused, so the person's own work stays stored until they choose "Keep it". "Go back to mine"
 * restores their stored work. A link that does not validate changes nothing and says why.
 */
import { useEffect, useRef, useState } from 'react';
import type { Project, ValidationIssue } from '../../core/index.ts';
import { hasSharedProject, openShareFragment } from '../../deliverables/shareLink.ts';
import { appSession } from '../../state/appSession.ts';
import { commitOpened } from '../../state/commit.ts';
import { useProjectStore } from '../../state/projectStore.ts';

export type SharedState =
  | { kind: 'none' }
  | { kind: 'viewing'; title: string }
  | { kind: 'refused'; issues: ValidationIssue[] };

function clearFragment(): void {
  history.replaceState(null, '', `${location.pathname}${location.search}`);
}

export function useSharedProject() {
  const [state, setState] = useState<SharedState>({ kind: 'none' });
  const [own, setOwn] = useState<Project | null>(null);
  /** True while a shared project is on screen (writing paused until the person chooses). */
  const viewing = useRef(false);

  // On load, and when a link is pasted into a tab that already shows the app (only the
  // fragment changes, so the page does not reload).
  useEffect(() => {
    const openFromHash = () => {
      if (!hasSharedProject(location.hash)) return;
      const hash = location.hash;
      clearFragment();
      const opened = openShareFragment(hash);
      if (!opened.ok) {
        setState({ kind: 'refused', issues: opened.issues });
        // Writing was paused at start for the link; nothing of it is shown, so carry on
        // (unless an earlier shared project is still on screen).
        if (!viewing.current) appSession()?.resume();
        return;
      }
      // Taken before the shared project replaces it. A second link while viewing the first
      // keeps the person's own work, not the first link.
      const mine = useProjectStore.getState().project;
      appSession()?.pause();
      const committed = commitOpened(opened.project, undefined, opened.notes);
      if (!committed.ok) {
        setState({ kind: 'refused', issues: committed.issues });
        if (!viewing.current) appSession()?.resume();
        return;
      }
      viewing.current = true;
      setOwn((previous) => previous ?? mine);
      setState({ kind: 'viewing', title: opened.project.title });
    };
    openFromHash();
    window.addEventListener('hashchange', openFromHash);
    return () => window.removeEventListener('hashchange', openFromHash);
  }, []);

  const keep = () => {
    viewing.current = false;
    appSession()?.resume();
    setOwn(null);
    setState({ kind: 'none' });
  };
  const goBack = () => {
    viewing.current = false;
    setState({ kind: 'none' });
    if (own) appSession()?.restoreStored(own);
    setOwn(null);
  };
  const dismiss = () => setState({ kind: 'none' });
  return { state, keep, goBack, dismiss };
}
