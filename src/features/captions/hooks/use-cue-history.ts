import { useCallback, useReducer } from 'react';
import { indexOfKey, type CueEdit, type EditorCue } from '../lib/cue-ops';
import { closeGroup, record, redo, startHistory, undo, type History } from '../lib/undo-history';

interface EditorState {
  history: History<EditorCue[]>;
  selected: string | null;
}

type Action =
  | { type: 'apply'; edit: (cues: EditorCue[], selected: string | null) => CueEdit; group: string | null }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'select'; key: string | null }
  | { type: 'close-group' };

function keepSelection(cues: EditorCue[], selected: string | null): string | null {
  return indexOfKey(cues, selected) >= 0 ? selected : (cues[0]?.key ?? null);
}

/** True when an operation changed nothing (same cues in the same order), so no undo step is made. */
function unchanged(a: readonly EditorCue[], b: readonly EditorCue[]): boolean {
  return a.length === b.length && a.every((cue, i) => cue === b[i]);
}

function reducer(state: EditorState, action: Action): EditorState {
  switch (action.type) {
    case 'apply': {
      const result = action.edit(state.history.present, state.selected);
      if (unchanged(result.cues, state.history.present)) return result.selected === state.selected ? state : { ...state, selected: result.selected };
      return { history: record(state.history, result.cues, action.group), selected: result.selected };
    }
    case 'undo': {
      const history = undo(state.history);
      return history === state.history ? state : { history, selected: keepSelection(history.present, state.selected) };
    }
    case 'redo': {
      const history = redo(state.history);
      return history === state.history ? state : { history, selected: keepSelection(history.present, state.selected) };
    }
    case 'select':
      return state.selected === action.key ? state : { history: closeGroup(state.history), selected: action.key };
    case 'close-group':
      return { ...state, history: closeGroup(state.history) };
  }
}

/** The cue list with its undo history and the selected cue. */
export interface CueHistory {
  cues: EditorCue[];
  selected: string | null;
  canUndo: boolean;
  canRedo: boolean;
  /** Applies an operation from cue-ops; edits with the same `group` (typing in one cue) undo together. */
  apply: (edit: (cues: EditorCue[], selected: string | null) => CueEdit, group?: string | null) => void;
  undo: () => void;
  redo: () => void;
  select: (key: string | null) => void;
  /** Ends a run of typing, so the next edit is an undo step of its own. */
  closeGroup: () => void;
}

/** Keeps the editor's cue list as undoable snapshots, starting from the list loaded from the server. */
export function useCueHistory(initial: EditorCue[]): CueHistory {
  const [state, dispatch] = useReducer(reducer, initial, (cues) => ({ history: startHistory(cues), selected: cues[0]?.key ?? null }));
  return {
    cues: state.history.present,
    selected: state.selected,
    canUndo: state.history.past.length > 0,
    canRedo: state.history.future.length > 0,
    apply: useCallback((edit, group = null) => dispatch({ type: 'apply', edit, group }), []),
    undo: useCallback(() => dispatch({ type: 'undo' }), []),
    redo: useCallback(() => dispatch({ type: 'redo' }), []),
    select: useCallback((key: string | null) => dispatch({ type: 'select', key }), []),
    closeGroup: useCallback(() => dispatch({ type: 'close-group' }), []),
  };
}
