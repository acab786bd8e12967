package dev.penduline.ui.internal.friction;

import java.lang.reflect.InvocationTargetException;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.function.Consumer;

import org.eclipse.core.resources.IFile;
import org.eclipse.core.runtime.ILog;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.jface.dialogs.IMessageProvider;
import org.eclipse.jface.dialogs.PageChangingEvent;
import org.eclipse.jface.wizard.IWizardContainer;
import org.eclipse.jface.wizard.Wizard;
import org.eclipse.jface.wizard.WizardDialog;

import dev.penduline.model.Mechanism;
import dev.penduline.model.TestSession;
import dev.penduline.physics.identify.FitControl;
import dev.penduline.physics.identify.FitSettings;
import dev.penduline.physics.identify.FitStatus;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.services.FitCurves;
import dev.penduline.services.FitRecorder;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.FrictionIdentification.Outcome;
import dev.penduline.services.FrictionIdentification.SessionInput;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.document.MechanismDocument;
import dev.penduline.ui.internal.document.MechanismDocuments;
import dev.penduline.ui.internal.editor.MechanismEdits;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;

/**
 * The Friction Fit wizard: sets up a fit of a mechanism file's test sessions, runs it with the
 * services of {@code penduline fit} in the wizard's container (forked, cancellable, with
 * progress), shows the outcome, and on Finish stores it as {@code penduline fit} does
 * ({@link FitRecorder#addTo}): as one undoable command of the open editor's document, or, when
 * no editor has the file open, in the file (a save that refuses a file changed on disk). Back,
 * Cancel and a cancelled run store nothing.
 */
public final class FitWizard extends Wizard {

    /** The label of the undoable command that stores a fit. */
    public static final String STORE_LABEL = "Store Friction Fit";

    private final IFile file;
    private final Path path;
    private final Consumer<String> stored;
    private final Mechanism listed;
    private final Optional<MechanismDocument> document;
    private FitSetupPage setup;
    private FitResultsPage results;
    private Outcome outcome;
    private volatile boolean running;

    /**
     * A wizard on a mechanism file.
     *
     * @param file   the mechanism file
     * @param stored receives the identifier of the fit stored by Finish
     * @throws InputException when the file cannot be read
     */
    public FitWizard(IFile file, Consumer<String> stored) throws InputException {
        this.file = file;
        this.path = MechanismSelection.pathOf(file);
        this.stored = stored;
        this.document = MechanismDocuments.of(file);
        this.listed = document.isPresent() ? document.get().mechanism() : MechanismLoader.readMechanism(path);
        setWindowTitle("Friction Fit");
        setNeedsProgressMonitor(true);
    }

    @Override
    public void addPages() {
        setup = new FitSetupPage(path, listed.getSessions(), calculatedInertia());
        results = new FitResultsPage();
        addPage(setup);
        addPage(results);
    }

    private double calculatedInertia() {
        try {
            return mechanismSource().properties().pivotInertia();
        } catch (InputException e) {
            return Double.NaN;
        }
    }

    private MechanismSource mechanismSource() throws InputException {
        return new MechanismLoader().loadMechanism(listed, path.toString());
    }

    @Override
    public void setContainer(IWizardContainer container) {
        super.setContainer(container);
        if (container instanceof WizardDialog dialog) {
            dialog.addPageChangingListener(this::changing);
        }
    }

    private void changing(PageChangingEvent event) {
        if (event.getCurrentPage() == setup && event.getTargetPage() == results) {
            event.doit = run();
        } else if (event.getTargetPage() == setup) {
            outcome = null;
        }
    }

    @Override
    public boolean canFinish() {
        return outcome != null && outcome.fit().converged();
    }

    /**
     * Runs the fit as set up on the first page, in the container with progress and cancel.
     *
     * @return whether there is an outcome to show
     */
    private boolean run() {
        outcome = null;
        List<TestSession> chosen = new ArrayList<>();
        for (TestSession s : setup.chosenSessions()) {
            chosen.add(EcoreUtil.copy(s));
        }
        Optional<Set<FrictionTerm>> terms = setup.terms();
        boolean fixInertia = setup.fixInertia();
        // the user's preferred verdict margin (and resamples as the spinner's start), as the preference page set them
        FitSettings defaults = WorkbenchDefaults.current().applyTo(FitSettings.defaults());
        FitSettings settings = defaults.withResampling(setup.resamples(), defaults.seed(), defaults.parallel());
        Outcome[] done = new Outcome[1];
        List<FitCurves.Curve> curves = new ArrayList<>();
        String[] failure = new String[1];
        boolean[] cancelled = new boolean[1];
        MechanismSource source;
        try {
            source = mechanismSource();
        } catch (InputException e) {
            setup.setErrorMessage(e.getMessage());
            return false;
        }
        running = true;
        try {
            getContainer().run(true, true, monitor -> {
                SubMonitor progress = SubMonitor.convert(monitor, "Fitting the friction of " + file.getName(), 10);
                try {
                    progress.subTask("Reading and analysing the test sessions");
                    List<SessionInput> inputs = FrictionIdentification.sessionsOf(path, chosen, source, false);
                    progress.worked(1);
                    FitControl control = FitControl.cancelledWhen(monitor::isCanceled)
                            .withMonitor(new FitProgress(monitor));
                    done[0] = FrictionIdentification.identify(source, inputs, terms, fixInertia, settings, control);
                    progress.worked(8);
                    if (done[0].fit().status() != FitStatus.CANCELLED) {
                        curves.addAll(FitCurves.of(done[0]));
                    }
                    progress.worked(1);
                    cancelled[0] = monitor.isCanceled();
                } catch (InputException e) {
                    failure[0] = e.getMessage();
                } catch (IllegalArgumentException e) {
                    failure[0] = path + ": " + e.getMessage();
                }
            });
        } catch (InvocationTargetException e) {
            ILog.of(FitWizard.class).error("friction fit of " + path + " failed", e.getCause());
            failure[0] = path + ": could not be fitted (" + e.getCause().getMessage() + "); the error log has the details";
        } catch (InterruptedException e) {
            failure[0] = null;
        } finally {
            running = false;
        }
        if (failure[0] != null) {
            setup.setErrorMessage(failure[0]);
            return false;
        }
        if (done[0] == null || cancelled[0] || done[0].fit().status() == FitStatus.CANCELLED) {
            setup.setMessage("The fit was cancelled. Nothing was stored.", IMessageProvider.WARNING);
            return false;
        }
        outcome = done[0];
        setup.setMessage(null);
        setup.setErrorMessage(null);
        results.show(outcome, curves);
        if (outcome.fit().converged()) {
            results.setMessage(null);
        } else {
            String status = outcome.fit().status().name().toLowerCase(Locale.ROOT).replace('_', ' ');
            results.setMessage("Nothing can be stored: the fit " + (outcome.fit().status() == FitStatus.MISFIT
                    ? "does not describe the records (misfit)" : "did not converge (" + status + "): "
                    + outcome.fit().message()), IMessageProvider.ERROR);
        }
        return true;
    }

    @Override
    public boolean performFinish() {
        if (outcome == null || !outcome.fit().converged()) {
            return false;
        }
        Instant now = Instant.now();
        String[] id = new String[1];
        try {
            Optional<MechanismDocument> open = MechanismDocuments.of(file);
            if (open.isPresent()) {
                if (!MechanismEdits.run(open.get(), STORE_LABEL, () -> id[0] = FitRecorder.addTo(open.get().mechanism(),
                        outcome, now))) {
                    results.setErrorMessage("The fit could not be added to the open editor's model.");
                    return false;
                }
            } else {
                MechanismDocument d = MechanismDocument.read(file);
                MechanismEdits.run(d, STORE_LABEL, () -> id[0] = FitRecorder.addTo(d.mechanism(), outcome, now));
                d.save(false, note -> ILog.of(FitWizard.class).info(note));
            }
        } catch (InputException e) {
            results.setErrorMessage(e.getMessage());
            return false;
        }
        stored.accept(id[0]);
        return true;
    }

    /** @return the first page */
    public FitSetupPage setupPage() {
        return setup;
    }

    /** @return the last page */
    public FitResultsPage resultsPage() {
        return results;
    }

    /** @return the outcome shown on the last page, or null */
    public Outcome outcome() {
        return outcome;
    }

    /** @return whether a fit runs now */
    public boolean running() {
        return running;
    }
}
