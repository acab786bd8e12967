package dev.penduline.ui.internal.wizard;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.eclipse.core.resources.IResource;
import org.eclipse.core.resources.IWorkspace;
import org.eclipse.core.resources.ResourcesPlugin;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import dev.penduline.services.NewMechanismFile;

/**
 * The one page of the new-project wizard: the project's name, the mechanism's name and,
 * optionally, a parts list to start from. Says what is missing before Finish is possible.
 */
final class NewMechanismProjectPage extends WizardPage {

    private Text project;
    private Text mechanism;
    private Text partsList;
    private Label fileName;
    private boolean mechanismEdited;

    NewMechanismProjectPage() {
        super("mechanismProject");
        setTitle("A mechanism project");
        setDescription("One project per mechanism: its mechanism file, its parts lists and its swing records.");
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayoutFactory.swtDefaults().numColumns(3).applyTo(c);
        project = field(c, "&Project name:");
        mechanism = field(c, "&Mechanism name:");
        new Label(c, SWT.NONE).setText("Mechanism file:");
        fileName = new Label(c, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).applyTo(fileName);
        new Label(c, SWT.NONE).setText("Parts &list (optional):");
        partsList = new Text(c, SWT.BORDER);
        partsList.setMessage("a parts-list CSV or CAD mass-property export");
        GridDataFactory.fillDefaults().grab(true, false).applyTo(partsList);
        Button browse = new Button(c, SWT.PUSH);
        browse.setText("&Browse...");
        browse.addListener(SWT.Selection, e -> {
            FileDialog d = new FileDialog(getShell(), SWT.OPEN);
            d.setText("Parts list to import");
            d.setFilterExtensions(new String[] {"*.csv", "*.*"});
            String chosen = d.open();
            if (chosen != null) {
                partsList.setText(chosen);
            }
        });
        Label note = new Label(c, SWT.WRAP);
        note.setText("The parts list is read now and stored in the mechanism file in SI units; the CSV itself "
                + "is not changed. Without one, the mechanism starts with no parts.");
        GridDataFactory.fillDefaults().grab(true, false).span(3, 1).hint(420, SWT.DEFAULT).indent(0, 8).applyTo(note);
        project.addListener(SWT.Modify, e -> {
            if (!mechanismEdited) {
                mechanism.setText(project.getText());
            }
            check();
        });
        mechanism.addListener(SWT.Modify, e -> check());
        mechanism.addListener(SWT.KeyDown, e -> mechanismEdited = true);
        partsList.addListener(SWT.Modify, e -> check());
        setControl(c);
        check();
        setErrorMessage(null);
    }

    @Override
    public void setVisible(boolean visible) {
        super.setVisible(visible);
        if (visible) {
            // the dialog gives the focus to its buttons; the user starts with the name
            project.setFocus();
        }
    }

    private static Text field(Composite c, String label) {
        new Label(c, SWT.NONE).setText(label);
        Text t = new Text(c, SWT.BORDER);
        GridDataFactory.fillDefaults().grab(true, false).span(2, 1).applyTo(t);
        return t;
    }

    /** Checks the fields and says what is missing; Finish is enabled only when all is well. */
    private void check() {
        String problem = problem();
        fileName.setText(mechanismName().isEmpty() ? "" : NewMechanismFile.fileName(mechanismName()));
        setErrorMessage(problem);
        setPageComplete(problem == null);
    }

    private String problem() {
        String name = projectName();
        if (name.isEmpty()) {
            return "Give the project a name.";
        }
        IWorkspace workspace = ResourcesPlugin.getWorkspace();
        IStatus valid = workspace.validateName(name, IResource.PROJECT);
        if (!valid.isOK()) {
            return valid.getMessage();
        }
        if (workspace.getRoot().getProject(name).exists()) {
            return "A project named '" + name + "' is already in the workspace.";
        }
        if (mechanismName().isEmpty()) {
            return "Give the mechanism a name (it is shown in the views and reports).";
        }
        Optional<Path> csv = partsListPath();
        if (csv.isPresent() && !Files.isRegularFile(csv.get())) {
            return csv.get() + ": no such file.";
        }
        return null;
    }

    String projectName() {
        return project.getText().strip();
    }

    String mechanismName() {
        return mechanism.getText().strip();
    }

    Optional<Path> partsListPath() {
        String p = partsList.getText().strip();
        return p.isEmpty() ? Optional.empty() : Optional.of(Path.of(p));
    }

    /**
     * Fills the fields, as a user would type them (for tests and for a caller that knows).
     *
     * @param projectName   the project's name
     * @param mechanismName the mechanism's name
     * @param csv           the parts list, or null
     */
    void fill(String projectName, String mechanismName, Path csv) {
        project.setText(projectName);
        mechanismEdited = true;
        mechanism.setText(mechanismName);
        partsList.setText(csv == null ? "" : csv.toString());
    }
}
