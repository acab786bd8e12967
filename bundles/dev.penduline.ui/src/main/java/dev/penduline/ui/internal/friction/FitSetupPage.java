package dev.penduline.ui.internal.friction;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

import dev.penduline.model.TestSession;
import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.services.FrictionIdentification;
import dev.penduline.services.SessionRecords;
import dev.penduline.services.TermWords;
import dev.penduline.services.present.Figures;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;

/**
 * The first page of the Friction Fit wizard: which test sessions to fit (with the state of each
 * record), the term sets (automatic, as {@code penduline fit} compares them, or chosen terms),
 * whether the pivot inertia J0 is fitted or held at the calculated value, and the number of
 * bootstrap refits (default as {@code penduline fit --resamples}).
 */
public final class FitSetupPage extends WizardPage {

    private static final String AUTOMATIC = "Automatic: compare the candidate term sets, keep the best by BIC"
            + " (as 'penduline fit')";
    private static final String CHOSEN = "Chosen terms:";

    /** Most bootstrap refits the page offers (the command line's limit too). */
    public static final int MAX_RESAMPLES = 1_000;

    private final Path mechanismFile;
    private final List<TestSession> sessions;
    private final double calculatedInertia;
    private Table table;
    private Combo termsChoice;
    private final List<Button> termButtons = new ArrayList<>();
    private Combo inertiaChoice;
    private Spinner resamples;

    FitSetupPage(Path mechanismFile, List<TestSession> sessions, double calculatedInertia) {
        super("fitSetup");
        this.mechanismFile = mechanismFile;
        this.sessions = List.copyOf(sessions);
        this.calculatedInertia = calculatedInertia;
        setTitle("Friction Fit: sessions and model");
        setDescription("Choose the test sessions, the friction terms and how the inertia is treated; Next runs the fit.");
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayoutFactory.swtDefaults().spacing(8, 8).applyTo(c);
        new Label(c, SWT.NONE).setText("Test sessions to fit:");
        table = new Table(c, SWT.CHECK | SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String title : new String[] {"Session", "Record", "Record state"}) {
            new TableColumn(table, SWT.LEFT).setText(title);
        }
        for (TestSession s : sessions) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {String.valueOf(s.getName()), String.valueOf(s.getRecordPath()), stateOf(s)});
            item.setChecked(true);
            item.setData(s);
        }
        for (TableColumn col : table.getColumns()) {
            col.pack();
        }
        table.addListener(SWT.Selection, e -> validate());
        GridDataFactory.fillDefaults().grab(true, true).hint(560, 110).applyTo(table);

        Group terms = new Group(c, SWT.NONE);
        terms.setText("Friction terms");
        GridLayoutFactory.swtDefaults().numColumns(5).applyTo(terms);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(terms);
        termsChoice = new Combo(terms, SWT.READ_ONLY | SWT.DROP_DOWN);
        termsChoice.setItems(AUTOMATIC, CHOSEN);
        termsChoice.select(0);
        termsChoice.addListener(SWT.Selection, e -> validate());
        for (FrictionTerm t : List.of(FrictionTerm.VISCOUS, FrictionTerm.COULOMB, FrictionTerm.STICTION,
                FrictionTerm.DRAG)) {
            Button b = new Button(terms, SWT.CHECK);
            b.setText(TermWords.word(t.name().toLowerCase(Locale.ROOT)) + " (" + t.symbol() + ")");
            b.setData(t);
            b.setSelection(t == FrictionTerm.VISCOUS || t == FrictionTerm.COULOMB);
            b.addListener(SWT.Selection, e -> validate());
            termButtons.add(b);
        }

        Composite inertia = new Composite(c, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).applyTo(inertia);
        new Label(inertia, SWT.NONE).setText("Pivot inertia J0:");
        inertiaChoice = new Combo(inertia, SWT.READ_ONLY | SWT.DROP_DOWN);
        inertiaChoice.setItems("fitted (free)", "held at the calculated value, " + Figures.significant(calculatedInertia)
                + " kg·m²");
        inertiaChoice.select(0);

        Composite row = new Composite(c, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(3).applyTo(row);
        new Label(row, SWT.NONE).setText("Bootstrap refits:");
        resamples = new Spinner(row, SWT.BORDER);
        resamples.setValues(Math.min(MAX_RESAMPLES, WorkbenchDefaults.current().resamples()), 0, MAX_RESAMPLES, 0, 1, 10);
        Label hint = new Label(row, SWT.NONE);
        hint.setText("for the resampling ± (0 turns it off; above 200 adds little)");
        setControl(c);
        validate();
    }

    private String stateOf(TestSession s) {
        return SessionRecords.recordState(mechanismFile, s, SessionRecords::sha256).words();
    }

    private void validate() {
        for (Button b : termButtons) {
            b.setEnabled(termsChoice.getSelectionIndex() == 1);
        }
        String error = null;
        if (chosenSessions().isEmpty()) {
            error = sessions.isEmpty() ? FrictionIdentification.noSessions(mechanismFile)
                    : "Choose at least one test session.";
        } else if (terms().isPresent() && terms().get().isEmpty()) {
            error = "Choose at least one friction term, or Automatic.";
        } else if (terms().isPresent() && terms().get().contains(FrictionTerm.STICTION)
                && !terms().get().contains(FrictionTerm.COULOMB)) {
            error = "Stiction needs Coulomb too (static friction is at least the dry friction).";
        }
        setErrorMessage(error);
        setPageComplete(error == null);
    }

    /** @return the checked sessions, in the file's order */
    public List<TestSession> chosenSessions() {
        List<TestSession> out = new ArrayList<>();
        for (TableItem item : table.getItems()) {
            if (item.getChecked()) {
                out.add((TestSession) item.getData());
            }
        }
        return out;
    }

    /** @return the chosen terms, empty for the automatic comparison */
    public Optional<Set<FrictionTerm>> terms() {
        if (termsChoice.getSelectionIndex() != 1) {
            return Optional.empty();
        }
        Set<FrictionTerm> set = EnumSet.noneOf(FrictionTerm.class);
        for (Button b : termButtons) {
            if (b.getSelection()) {
                set.add((FrictionTerm) b.getData());
            }
        }
        return Optional.of(set);
    }

    /** @return whether J0 is held at the calculated value */
    public boolean fixInertia() {
        return inertiaChoice.getSelectionIndex() == 1;
    }

    /** @return the bootstrap refits */
    public int resamples() {
        return resamples.getSelection();
    }

    /** @return the sessions table, for tests */
    public Table sessionsTable() {
        return table;
    }

    /** @return the choice of term sets (0: automatic, 1: the chosen terms), for tests */
    public Combo termsChoice() {
        return termsChoice;
    }

    /** @return the term check boxes (viscous, Coulomb, stiction, drag), for tests */
    public List<Button> termButtons() {
        return List.copyOf(termButtons);
    }

    /** @return the choice of the inertia (0: fitted, 1: held at the calculated value), for tests */
    public Combo inertiaChoice() {
        return inertiaChoice;
    }

    /** @return the spinner of bootstrap refits, for tests */
    public Spinner resamplesSpinner() {
        return resamples;
    }
}
