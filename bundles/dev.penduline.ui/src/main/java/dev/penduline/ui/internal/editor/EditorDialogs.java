package dev.penduline.ui.internal.editor;

import java.util.function.BiFunction;
import java.util.function.Function;

import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;

/**
 * The questions the mechanism editor asks in dialogs, each replaceable so that tests answer
 * them without a native dialog (the workbench always uses the defaults).
 */
public final class EditorDialogs {

    /** Answer of {@link #importModeChooser}: the list replaces the parts. */
    public static final int REPLACE = 0;
    /** Answer of {@link #importModeChooser}: the list's parts replace those of the same name, the rest are added. */
    public static final int MERGE = 1;
    /** Answer of {@link #importModeChooser}: nothing is imported. */
    public static final int CANCEL = 2;

    /** Chooses a parts list (CSV) to import; null when the user cancels. */
    public static Function<Shell, String> partsListChooser = EditorDialogs::choosePartsList;

    /** Asks whether a parts list (the path) replaces the parts or merges into them. */
    public static BiFunction<Shell, String, Integer> importModeChooser = EditorDialogs::askImportMode;

    /** Asks whether to replace a file another program changed since it was opened (the path). */
    public static BiFunction<Shell, String, Boolean> replaceChangedFile = (shell, path) -> MessageDialog.openQuestion(shell,
            "File Changed on Disk", path + " was changed by another program or the command line since it was opened.\n\n"
                    + "Replace it with the editor's content? (No keeps the file as it is; Revert reads it.)");

    private EditorDialogs() {
    }

    private static String choosePartsList(Shell shell) {
        FileDialog d = new FileDialog(shell, SWT.OPEN);
        d.setText("Import Parts List");
        d.setFilterExtensions(new String[] {"*.csv", "*.*"});
        d.setFilterNames(new String[] {"Parts lists (*.csv)", "All files"});
        return d.open();
    }

    private static int askImportMode(Shell shell, String path) {
        MessageDialog d = new MessageDialog(shell, "Import Parts List", null, "Bring in the parts of " + path + ":\n\n"
                + "Replace: the mechanism's parts become exactly those of the list.\n"
                + "Merge: a part of the same name is replaced in place, the others are added.\n\n"
                + "Sessions and friction hypotheses stay; fits stored before are marked stale if the inertia moves.",
                MessageDialog.QUESTION, 0, "Replace", "Merge", "Cancel");
        int answer = d.open();
        return answer == 0 ? REPLACE : answer == 1 ? MERGE : CANCEL;
    }
}
