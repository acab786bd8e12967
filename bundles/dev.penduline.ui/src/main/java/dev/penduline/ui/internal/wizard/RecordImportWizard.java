package dev.penduline.ui.internal.wizard;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.CoreException;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.ui.IImportWizard;
import org.eclipse.ui.IWorkbench;

import dev.penduline.model.Mechanism;
import dev.penduline.services.InputException;
import dev.penduline.services.SessionRecords;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.editor.MechanismEdits;

/**
 * File › Import › Swing Records: adds records to a mechanism as test sessions, as
 * {@code penduline add-session} does, each read with the mapping shown (and overridden) on the
 * page. The records are copied unchanged into {@code records/}; the sessions are added as one
 * command — undoable in the editor when the file is open there, else saved at once.
 */
public final class RecordImportWizard extends Wizard implements IImportWizard {

    /** Chooses the record files to add; null when the user cancels. Tests replace it. */
    public static Function<Shell, List<String>> recordChooser = RecordImportWizard::chooseRecords;

    private IFile mechanism;
    private List<Path> initial = List.of();
    private RecordImportPage page;

    /** Created by the workbench's import wizard list. */
    public RecordImportWizard() {
        setWindowTitle("Import Swing Records");
        setNeedsProgressMonitor(false);
    }

    @Override
    public void init(IWorkbench workbench, IStructuredSelection selection) {
        mechanism = MechanismSelection.fileOf(selection).filter(MechanismSelection::isMechanismFile).orElse(null);
    }

    /**
     * Opens the wizard on a mechanism with records already chosen (a drop of CSV files on it).
     *
     * @param shell     the parent shell
     * @param mechanism the mechanism file
     * @param records   the records dropped
     * @return the dialog's return code
     */
    public static int open(Shell shell, IFile mechanism, List<Path> records) {
        return dialog(shell, mechanism, records).open();
    }

    /**
     * The wizard's dialog on a mechanism with records already chosen, not yet opened.
     *
     * @param shell     the parent shell
     * @param mechanism the mechanism file (null: chosen on the page)
     * @param records   the records to start with
     * @return the dialog
     */
    public static WizardDialog dialog(Shell shell, IFile mechanism, List<Path> records) {
        RecordImportWizard w = new RecordImportWizard();
        w.mechanism = mechanism;
        w.initial = List.copyOf(records);
        return new WizardDialog(shell, w);
    }

    @Override
    public void addPages() {
        page = new RecordImportPage(mechanismFiles(), mechanism, initial);
        addPage(page);
    }

    /** @return the mechanism files in the open projects of the workspace */
    static List<IFile> mechanismFiles() {
        List<IFile> found = new ArrayList<>();
        try {
            ResourcesPlugin.getWorkspace().getRoot().accept(r -> {
                if (r instanceof IFile f && MechanismSelection.isMechanismFile(f)) {
                    found.add(f);
                }
                return r.getType() != IResource.FILE && (r.getType() != IResource.PROJECT || r.isAccessible());
            });
        } catch (CoreException e) {
            // the list shows what was found
        }
        return found;
    }

    @Override
    public boolean performFinish() {
        IFile file = page.mechanism();
        Path mechanismFile = MechanismSelection.pathOf(file);
        Optional<MechanismDocument> open = MechanismDocuments.of(file);
        List<Path> copies = new ArrayList<>();
        try {
            MechanismDocument document = open.isPresent() ? open.get() : MechanismDocument.read(file);
            // checked against the sessions there and those before it in this import
            Mechanism scratch = EcoreUtil.copy(document.mechanism());
            List<SessionRecords.Pending> pending = new ArrayList<>();
            for (RecordChoice r : page.records()) {
                SessionRecords.Pending p = SessionRecords.pending(scratch, mechanismFile, r.file(), r.options(), r.name(),
                        Double.NaN, null);
                p.addTo(scratch);
                pending.add(p);
            }
            for (SessionRecords.Pending p : pending) {
                if (p.copyIn()) {
                    copies.add(p.storedAt());
                }
            }
            String label = pending.size() == 1 ? "Add session " + pending.get(0).name() : "Add " + pending.size() + " sessions";
            MechanismEdits.run(document, label, () -> pending.forEach(p -> p.addTo(document.mechanism())));
            if (open.isEmpty()) {
                document.save(false, note -> { });
            }
            file.getProject().refreshLocal(IResource.DEPTH_INFINITE, null);
            return true;
        } catch (InputException | IllegalArgumentException e) {
            copies.forEach(RecordImportWizard::deleteCopy);
            page.failed(e.getMessage());
            return false;
        } catch (CoreException e) {
            // the sessions are added; the workspace sees the copies on its next refresh
            return true;
        }
    }

    private static void deleteCopy(Path copy) {
        try {
            Files.deleteIfExists(copy);
        } catch (IOException e) {
            // a copy of a raw record left in records/ is harmless
        }
    }

    private static List<String> chooseRecords(Shell shell) {
        FileDialog d = new FileDialog(shell, SWT.OPEN | SWT.MULTI);
        d.setText("Swing Records to Import");
        d.setFilterExtensions(new String[] {"*.csv;*.txt", "*.*"});
        d.setFilterNames(new String[] {"Swing records (*.csv, *.txt)", "All files"});
        if (d.open() == null) {
            return null;
        }
        return Arrays.stream(d.getFileNames()).map(n -> Path.of(d.getFilterPath(), n).toString()).toList();
    }

}
