package dev.penduline.ui.internal;

import java.util.ArrayList;
import java.util.List;

import jakarta.annotation.PostConstruct;
import jakarta.inject.Inject;
import jakarta.inject.Named;

import org.eclipse.core.resources.IFile;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Link;
import org.eclipse.ui.IWorkbenchPage;
import org.eclipse.ui.IWorkbenchWindow;
import org.eclipse.ui.PartInitException;
import org.eclipse.ui.PlatformUI;

import dev.penduline.model.Mechanism;
import dev.penduline.services.Cautions;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.wizard.RecordImportWizard;

/**
 * The start page of the workbench: what Penduline does, where to begin, the next steps for the
 * mechanism selected (edit it, import swing records, fit the friction, try a swing), the one to
 * take now marked, and the usual caution.
 */
public final class SwingDeskPart {

    /** A next step: its link text and what it does. */
    private record Step(String text, Runnable action) {
    }

    private Composite steps;
    private Label stepsTitle;
    private IFile file;
    private Object pending;

    /**
     * Builds the page.
     *
     * @param parent the part's composite
     */
    @PostConstruct
    public void create(Composite parent) {
        GridLayoutFactory.swtDefaults().margins(16, 16).applyTo(parent);
        Label title = new Label(parent, SWT.NONE);
        title.setText("Penduline - pivoted mechanisms");
        title.setFont(JFaceResources.getHeaderFont());
        Label body = new Label(parent, SWT.WRAP);
        body.setText("Compute the pivot inertia and centroid of hatches, swing arms, gates and flaps from a parts list, "
                + "import free-release swing records, and find which friction losses dominate.\n\n"
                + "To begin: File › Open Mechanism Folder… opens a folder that holds a mechanism file (.penduline) "
                + "and its records where it is, next to the CAD; File › New › Mechanism Project starts a new one "
                + "from a parts list. Select the mechanism file in Project Files (double-click edits it): the Mechanism "
                + "view shows its inertia part by part, the Swing Chart its test sessions, the Friction view the fits "
                + "stored in it.");
        GridDataFactory.fillDefaults().grab(true, false).hint(480, SWT.DEFAULT).applyTo(body);
        stepsTitle = new Label(parent, SWT.NONE);
        stepsTitle.setFont(JFaceResources.getBannerFont());
        steps = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().spacing(4, 6).applyTo(steps);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(steps);
        Label caution = new Label(parent, SWT.WRAP);
        caution.setText(Cautions.TEXT);
        caution.setFont(JFaceResources.getFontRegistry().getItalic(JFaceResources.DEFAULT_FONT));
        GridDataFactory.fillDefaults().grab(true, false).hint(480, SWT.DEFAULT).applyTo(caution);
        follow(pending);
    }

    /**
     * Follows the selected mechanism file.
     *
     * @param selection the active selection (may be null)
     */
    @Inject
    public void follow(@Optional @Named(IServiceConstants.ACTIVE_SELECTION) Object selection) {
        if (steps == null) {
            pending = selection;
            return;
        }
        if (steps.isDisposed()) {
            return;
        }
        java.util.Optional<IFile> chosen = MechanismSelection.fileOf(selection).filter(MechanismSelection::isMechanismFile);
        if (chosen.isPresent() || file == null) {
            file = chosen.orElse(null);
            showSteps();
        }
    }

    /** Lists the next steps for the file, the first one not yet done marked as the one to take now. */
    private void showSteps() {
        for (var c : steps.getChildren()) {
            c.dispose();
        }
        if (file == null) {
            stepsTitle.setText("Next steps: select a mechanism file");
            steps.getParent().layout(true, true);
            return;
        }
        int sessions = -1;
        int fits = -1;
        try {
            Mechanism m = MechanismDocuments.of(file).map(d -> d.mechanism()).orElse(null);
            if (m == null) {
                m = MechanismLoader.readMechanism(MechanismSelection.pathOf(file));
            }
            sessions = m.getSessions().size();
            fits = m.getFitResults().size();
        } catch (InputException e) {
            // a broken file: the steps still lead to the editor, where its problem shows
        }
        stepsTitle.setText("Next steps for " + file.getName());
        List<Step> all = new ArrayList<>();
        all.add(new Step("<a>Edit the mechanism</a> (parts, pivot, friction hypotheses) in the Mechanism Editor",
                () -> ProjectFilesPart.openEditor(file)));
        all.add(new Step("<a>Import swing records...</a> as test sessions" + count(sessions, "session"),
                () -> RecordImportWizard.open(steps.getShell(), file, List.of())));
        all.add(new Step("<a>Fit the friction</a> of the sessions (Friction view, Fit Friction...)" + count(fits, "stored fit"),
                () -> showView(PendulineViews.FRICTION)));
        all.add(new Step("<a>Try a swing</a> in the Swing Trial: release, friction and what the mechanism will do",
                () -> showView(PendulineViews.WHAT_IF)));
        int now = sessions == 0 ? 1 : fits == 0 ? 2 : sessions > 0 ? 3 : 0;
        for (int i = 0; i < all.size(); i++) {
            Step s = all.get(i);
            Link link = new Link(steps, SWT.WRAP);
            link.setText((i == now ? "Now: " : "") + s.text());
            if (i == now) {
                link.setFont(JFaceResources.getFontRegistry().getBold(JFaceResources.DEFAULT_FONT));
            }
            link.addListener(SWT.Selection, e -> s.action().run());
            GridDataFactory.fillDefaults().grab(true, false).hint(460, SWT.DEFAULT).applyTo(link);
        }
        steps.getParent().layout(true, true);
    }

    private static String count(int n, String what) {
        return n < 0 ? "" : " (" + n + " " + what + (n == 1 ? "" : "s") + " now)";
    }

    private static void showView(String id) {
        IWorkbenchWindow window = PlatformUI.getWorkbench().getActiveWorkbenchWindow();
        IWorkbenchPage page = window == null ? null : window.getActivePage();
        if (page != null) {
            try {
                page.showView(id);
            } catch (PartInitException e) {
                // the view is registered by this bundle; failing to show it leaves the desk as it is
            }
        }
    }

    /**
     * The next-step links shown now (for tests).
     *
     * @return the links' texts, the one to take now first prefixed "Now: "
     */
    public List<String> steps() {
        List<String> out = new ArrayList<>();
        for (var c : steps.getChildren()) {
            if (c instanceof Link l) {
                out.add(l.getText());
            }
        }
        return out;
    }

    /**
     * Follows a step's link as a user clicking it does.
     *
     * @param index the step's position
     */
    public void take(int index) {
        Link l = (Link) steps.getChildren()[index];
        l.notifyListeners(SWT.Selection, new Event());
    }
}
