import { useEffect, useRef } from 'react';

export interface WorkspaceShortcuts {
  onSave?: () => void;
  onUndo?: () => void;
  onRedo?: () => void;
}

/**
 * Ctrl/Cmd+S saves, Ctrl/Cmd+Z undoes, Ctrl/Cmd+Shift+Z (or Ctrl+Y) redoes, anywhere in the
 * workspace. A notes box keeps its own text undo.
 */
export function useWorkspaceShortcuts(shortcuts: WorkspaceShortcuts): void {
  const latest = useRef(shortcuts);
  useEffect(() => {
    latest.current = shortcuts;
  });
  useEffect(() => {
    const onKeyDown = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey) return;
      const key = e.key.toLowerCase();
      const { onSave, onUndo, onRedo } = latest.current;
      if (key === 's') {
        e.preventDefault();
        onSave?.();
        return;
      }
      if (e.target instanceof HTMLTextAreaElement) return;
      if (key === 'z' && !e.shiftKey && onUndo) {
        e.preventDefault();
        onUndo();
      } else if (((key === 'z' && e.shiftKey) || key === 'y') && onRedo) {
        e.preventDefault();
        onRedo();
      }
    };
    window.addEventListener('keydown', onKeyDown);
    return () => window.removeEventListener('keydown', onKeyDown);
  }, []);
}
