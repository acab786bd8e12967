package dev.penduline.ui.internal.editor;

import java.util.EventObject;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStack;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.jface.action.Action;
import org.eclipse.ui.IActionBars;
import org.eclipse.ui.IEditorPart;
import org.eclipse.ui.actions.ActionFactory;
import org.eclipse.ui.part.EditorActionBarContributor;

/**
 * Connects the workbench's Edit › Undo, Edit › Redo and File › Revert to the active mechanism
 * editor: undo and redo act on its document's command stack and are named after the command
 * they would undo or redo ("Undo Set length of arm").
 */
public final class MechanismEditorContributor extends EditorActionBarContributor {

    private final StackAction undo = new StackAction(true);
    private final StackAction redo = new StackAction(false);
    private final Action revert = new Action("Revert") {
        @Override
        public void run() {
            if (editor != null) {
                editor.revert();
            }
        }
    };
    private MechanismEditor editor;

    @Override
    public void init(IActionBars bars) {
        super.init(bars);
        bars.setGlobalActionHandler(ActionFactory.UNDO.getId(), undo);
        bars.setGlobalActionHandler(ActionFactory.REDO.getId(), redo);
        bars.setGlobalActionHandler(ActionFactory.REVERT.getId(), revert);
    }

    @Override
    public void setActiveEditor(IEditorPart targetEditor) {
        editor = targetEditor instanceof MechanismEditor m ? m : null;
        CommandStack stack = editor == null || editor.document() == null ? null : editor.document().commandStack();
        undo.follow(stack);
        redo.follow(stack);
        revert.setEnabled(editor != null);
        getActionBars().updateActionBars();
    }

    @Override
    public void dispose() {
        undo.follow(null);
        redo.follow(null);
        super.dispose();
    }

    /** Undo or redo on one command stack, enabled and named as the stack allows. */
    private static final class StackAction extends Action implements CommandStackListener {
        private final boolean undo;
        private CommandStack stack;

        StackAction(boolean undo) {
            super(undo ? "Undo" : "Redo");
            this.undo = undo;
            setActionDefinitionId(undo ? "org.eclipse.ui.edit.undo" : "org.eclipse.ui.edit.redo");
        }

        void follow(CommandStack next) {
            if (stack != null) {
                stack.removeCommandStackListener(this);
            }
            stack = next;
            if (stack != null) {
                stack.addCommandStackListener(this);
            }
            update();
        }

        @Override
        public void commandStackChanged(EventObject event) {
            update();
        }

        private void update() {
            boolean can = stack != null && (undo ? stack.canUndo() : stack.canRedo());
            Command next = stack == null ? null : undo ? stack.getUndoCommand() : stack.getRedoCommand();
            String label = next == null || next.getLabel() == null ? "" : " " + next.getLabel();
            setText((undo ? "&Undo" : "&Redo") + label);
            setEnabled(can);
        }

        @Override
        public void run() {
            if (stack != null && (undo ? stack.canUndo() : stack.canRedo())) {
                if (undo) {
                    stack.undo();
                } else {
                    stack.redo();
                }
            }
        }
    }
}
