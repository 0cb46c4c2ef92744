/**
 * Opening a share link: the shared project is shown, but the person's own autosaved work stays
 * in storage until they choose "Keep it". "Go back to mine" restores their project. A link
 * that does not validate changes nothing and says why.
 */
import { useEffect, useState } from 'react';
import type { Project, ValidationIssue } from '../../core/index.ts';
import { hasSharedProject, openShareFragment } from '../../deliverables/shareLink.ts';
import { AUTOSAVE_KEY, browserStorage, writeAutosave } from '../../state/autosave.ts';
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
  const [own, setOwn] = useState<{ project: Project; stored: string | null } | null>(null);

  // On load, and when a link is pasted into a tab that already shows the app (only the
  // fragment changes, so the page does not reload).
  useEffect(() => {
    const openFromHash = () => {
      if (!hasSharedProject(location.hash)) return;
      // The link leaves the address bar before it is read: a link that hangs or crashes the
      // tab must not do it again on every reload.
      const hash = location.hash;
      clearFragment();
      const opened = openShareFragment(hash);
      if (!opened.ok) {
        setState({ kind: 'refused', issues: opened.issues });
        return;
      }
      // Taken before the shared project replaces it. A second link while viewing the first
      // keeps the person's own work, not the first link.
      const mine = {
        project: useProjectStore.getState().project,
        stored: browserStorage()?.getItem(AUTOSAVE_KEY) ?? null,
      };
      setOwn((previous) => previous ?? mine);
      useProjectStore.getState().setProject(opened.project);
      setState({ kind: 'viewing', title: opened.project.title });
    };
    openFromHash();
    window.addEventListener('hashchange', openFromHash);
    return () => window.removeEventListener('hashchange', openFromHash);
  }, []);

  // While viewing, every autosave of the shared project is put back to the person's own work.
  useEffect(() => {
    if (state.kind !== 'viewing' || !own) return;
    const restore = () => {
      try {
        if (own.stored === null) localStorage.removeItem(AUTOSAVE_KEY);
        else localStorage.setItem(AUTOSAVE_KEY, own.stored);
      } catch {
        // storage blocked: nothing was autosaved either
      }
    };
    restore();
    return useProjectStore.subscribe(restore);
  }, [state, own]);

  const keep = () => {
    writeAutosave(browserStorage(), useProjectStore.getState().project);
    clearFragment();
    setOwn(null);
    setState({ kind: 'none' });
  };
  const goBack = () => {
    if (own) {
      setState({ kind: 'none' });
      useProjectStore.getState().setProject(own.project);
      setOwn(null);
    }
    clearFragment();
  };
  const dismiss = () => setState({ kind: 'none' });
  return { state, keep, goBack, dismiss };
}
