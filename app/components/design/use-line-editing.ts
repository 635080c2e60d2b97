import { useCallback, useMemo, useRef, useState } from "react";
import type { DesignPageLine } from "~/designs/design-page.server";
import type { LineKind } from "./line-editor";
import type { LineTableActions } from "./line-tables";

export interface LineEditing {
  /** A new number for each editor opened, so its typed values belong to it alone. */
  session: number;
  kind: LineKind;
  /** The line's position; null while a new line is not added yet. */
  position: number | null;
}

/**
 * Which line of the bill of materials is open in an editor (at most one): start editing
 * a line or a new one, note a new line's position once added, close. The editor is open
 * only while the page is editable and the line is still there.
 */
export function useLineEditing(lines: DesignPageLine[], editable: boolean) {
  const sessions = useRef(0);
  const [editing, setEditing] = useState<LineEditing | null>(null);
  const startEditing = useCallback(
    (kind: LineKind, position: number | null) => {
      sessions.current += 1;
      setEditing({ session: sessions.current, kind, position });
    },
    [],
  );
  const onAdded = useCallback(
    (position: number) =>
      setEditing((current) => (current ? { ...current, position } : current)),
    [],
  );
  const close = useCallback(() => setEditing(null), []);
  const editingLine =
    editing?.position != null
      ? (lines.find((line) => line.position === editing.position) ?? null)
      : null;
  // The line went (removed elsewhere) or the revision was released: nothing to edit.
  const editorOpen =
    editable &&
    editing !== null &&
    (editing.position === null || editingLine !== null);

  const actions: LineTableActions = useMemo(
    () => ({
      onEdit: editable
        ? (line: DesignPageLine) => startEditing(line.kind, line.position)
        : null,
      onRemove: close,
      editingPosition: editorOpen ? (editing?.position ?? null) : null,
    }),
    [editable, startEditing, close, editorOpen, editing?.position],
  );

  return {
    editing,
    editingLine,
    editorOpen,
    startEditing,
    onAdded,
    close,
    actions,
  };
}
