package dev.penduline.ui.internal.wizard;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Function;

import org.eclipse.core.resources.IFile;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.ArrayContentProvider;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TableViewer;
import org.eclipse.jface.viewers.TableViewerColumn;
import org.eclipse.jface.wizard.WizardPage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.MechanismSource;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.chart.SwingChart;
import dev.penduline.ui.internal.chart.SwingChartContent;

/**
 * The one page of the record import: the mechanism to add sessions to, the records, and for the
 * selected record the layout the reader detected, the mapping to override (columns, units,
 * counts per revolution; a count stated in the record's own comment lines is read from there)
 * and the record plotted with its release and stop as the analysis finds them.
 */
final class RecordImportPage extends WizardPage {

    private final List<IFile> mechanisms;
    private final List<RecordChoice> records = new ArrayList<>();
    private IFile mechanism;
    private Optional<MechanismSource> computed = Optional.empty();
    private Combo mechanismCombo;
    private TableViewer list;
    private Text name;
    private Text timeColumn;
    private Text angleColumn;
    private Combo timeUnit;
    private Combo angleUnit;
    private Text counts;
    private Label detected;
    private SwingChart chart;
    private boolean filling;

    RecordImportPage(List<IFile> mechanisms, IFile chosen, List<Path> initial) {
        super("records", "Import Swing Records", null);
        setDescription("Add free-release swing records to a mechanism as test sessions. Each record is copied unchanged into"
                + " the project's records/ folder.");
        this.mechanisms = mechanisms;
        this.mechanism = chosen;
        initial.forEach(p -> records.add(new RecordChoice(p)));
    }

    @Override
    public void createControl(Composite parent) {
        Composite c = new Composite(parent, SWT.NONE);
        GridLayoutFactory.swtDefaults().numColumns(2).applyTo(c);
        new Label(c, SWT.NONE).setText("Mechanism file:");
        mechanismCombo = new Combo(c, SWT.READ_ONLY);
        mechanisms.forEach(f -> mechanismCombo.add(f.getFullPath().toString()));
        GridDataFactory.fillDefaults().grab(true, false).applyTo(mechanismCombo);
        if (mechanism != null && mechanisms.contains(mechanism)) {
            mechanismCombo.select(mechanisms.indexOf(mechanism));
        }
        mechanismCombo.addListener(SWT.Selection, e -> {
            mechanism = mechanismCombo.getSelectionIndex() < 0 ? null : mechanisms.get(mechanismCombo.getSelectionIndex());
            computeMechanism();
            showSelected();
        });

        list = new TableViewer(c, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE);
        list.getTable().setHeaderVisible(true);
        list.setContentProvider(ArrayContentProvider.getInstance());
        column("record", 220, r -> r.file().getFileName().toString());
        column("session name", 160, RecordChoice::name);
        column("read as", 140, RecordChoice::state);
        list.setInput(records);
        GridDataFactory.fillDefaults().span(1, 1).grab(true, false).hint(520, 90).applyTo(list.getControl());
        list.addSelectionChangedListener(e -> showSelected());
        Composite buttons = new Composite(c, SWT.NONE);
        GridLayoutFactory.fillDefaults().applyTo(buttons);
        GridDataFactory.fillDefaults().align(SWT.FILL, SWT.BEGINNING).applyTo(buttons);
        Button add = new Button(buttons, SWT.PUSH);
        add.setText("Add Records...");
        add.addListener(SWT.Selection, e -> addRecords());
        Button remove = new Button(buttons, SWT.PUSH);
        remove.setText("Remove");
        remove.addListener(SWT.Selection, e -> {
            selected().ifPresent(records::remove);
            list.refresh();
            showSelected();
        });
        GridDataFactory.fillDefaults().applyTo(add);
        GridDataFactory.fillDefaults().applyTo(remove);

        Composite mapping = new Composite(c, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(6).applyTo(mapping);
        GridDataFactory.fillDefaults().span(2, 1).grab(true, false).applyTo(mapping);
        name = field(mapping, "Session name:", 3);
        counts = field(mapping, "Counts/rev:", 1);
        timeColumn = field(mapping, "Time column:", 1);
        timeUnit = choice(mapping, "Time unit:", RecordChoice.TIME_UNITS);
        angleColumn = field(mapping, "Angle column:", 1);
        angleUnit = choice(mapping, "Angle unit:", RecordChoice.ANGLE_UNITS);
        Label hint = new Label(mapping, SWT.WRAP);
        hint.setText("Blank fields are detected from the record, as 'penduline analyze' does; a column is a header name or"
                + " a number (1 is the first).");
        GridDataFactory.fillDefaults().span(6, 1).grab(true, false).hint(500, SWT.DEFAULT).applyTo(hint);

        // the detected layout beside the plot, so the plot keeps its height
        Composite below = new Composite(c, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).applyTo(below);
        GridDataFactory.fillDefaults().span(2, 1).grab(true, true).applyTo(below);
        detected = new Label(below, SWT.WRAP);
        GridDataFactory.fillDefaults().align(SWT.FILL, SWT.BEGINNING).hint(330, SWT.DEFAULT).applyTo(detected);
        Composite plot = new Composite(below, SWT.NONE);
        plot.setLayout(new FillLayout());
        chart = new SwingChart(plot);
        GridDataFactory.fillDefaults().grab(true, true).hint(480, 300).applyTo(plot);
        setControl(c);
        computeMechanism();
        records.forEach(RecordChoice::read);
        list.refresh();
        if (!records.isEmpty()) {
            list.setSelection(new StructuredSelection(records.get(0)));
        }
        showSelected();
    }

    private void column(String title, int width, Function<RecordChoice, String> text) {
        TableViewerColumn col = new TableViewerColumn(list, SWT.LEFT);
        col.getColumn().setText(title);
        col.getColumn().setWidth(width);
        col.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply((RecordChoice) element);
            }
        });
    }

    private Text field(Composite parent, String label, int span) {
        new Label(parent, SWT.NONE).setText(label);
        Text t = new Text(parent, SWT.BORDER);
        GridDataFactory.fillDefaults().grab(true, false).span(span, 1).hint(90, SWT.DEFAULT).applyTo(t);
        t.addListener(SWT.DefaultSelection, e -> apply());
        t.addListener(SWT.FocusOut, e -> apply());
        return t;
    }

    private Combo choice(Composite parent, String label, List<String> values) {
        new Label(parent, SWT.NONE).setText(label);
        Combo combo = new Combo(parent, SWT.READ_ONLY);
        values.forEach(v -> combo.add(v.isEmpty() ? "(detect)" : v));
        combo.select(0);
        combo.addListener(SWT.Selection, e -> apply());
        return combo;
    }

    private void computeMechanism() {
        computed = Optional.empty();
        if (mechanism != null) {
            try {
                computed = Optional.of(new MechanismLoader().load(MechanismSelection.pathOf(mechanism)));
            } catch (InputException e) {
                // the records are still read and plotted; the period check needs the mechanism
                computed = Optional.empty();
            }
        }
    }

    private void addRecords() {
        List<String> chosen = RecordImportWizard.recordChooser.apply(getShell());
        if (chosen == null || chosen.isEmpty()) {
            return;
        }
        RecordChoice last = null;
        for (String s : chosen) {
            Path p = Path.of(s);
            if (records.stream().anyMatch(r -> r.file().equals(p))) {
                continue;
            }
            last = new RecordChoice(p);
            last.read();
            records.add(last);
        }
        list.refresh();
        if (last != null) {
            list.setSelection(new StructuredSelection(last));
        }
        showSelected();
    }

    private Optional<RecordChoice> selected() {
        Object first = list.getStructuredSelection().getFirstElement();
        return first instanceof RecordChoice r ? Optional.of(r) : Optional.empty();
    }

    /** Takes the mapping fields into the selected record and reads it again. */
    private void apply() {
        if (filling) {
            return;
        }
        selected().ifPresent(r -> {
            String n = name.getText().trim();
            r.name(n.isEmpty() ? r.name() : n);
            r.mapping(timeColumn.getText(), angleColumn.getText(), RecordChoice.TIME_UNITS.get(Math.max(0,
                    timeUnit.getSelectionIndex())), RecordChoice.ANGLE_UNITS.get(Math.max(0, angleUnit.getSelectionIndex())),
                    counts.getText());
            list.refresh(r);
            showSelected();
        });
    }

    private void showSelected() {
        Optional<RecordChoice> r = selected();
        filling = true;
        try {
            name.setText(r.map(RecordChoice::name).orElse(""));
            timeColumn.setText(r.map(RecordChoice::timeColumn).orElse(""));
            angleColumn.setText(r.map(RecordChoice::angleColumn).orElse(""));
            counts.setText(r.map(RecordChoice::counts).orElse(""));
            timeUnit.select(Math.max(0, RecordChoice.TIME_UNITS.indexOf(r.map(RecordChoice::timeUnit).orElse(""))));
            angleUnit.select(Math.max(0, RecordChoice.ANGLE_UNITS.indexOf(r.map(RecordChoice::angleUnit).orElse(""))));
        } finally {
            filling = false;
        }
        if (r.isEmpty()) {
            detected.setText(records.isEmpty() ? "Add the records to import (CSV files of time and angle)." : "");
            chart.draw(SwingChartContent.failed("No record selected", ""));
        } else {
            RecordChoice c = r.get();
            detected.setText(c.error().map(e -> "Cannot be read: " + e)
                    .orElse("Detected layout:\n  assumed: " + String.join("\n  assumed: ", c.assumed())));
            chart.draw(c.content(computed));
        }
        detected.getParent().layout(true, true);
        validate();
    }

    private void validate() {
        String problem = null;
        if (mechanism == null) {
            problem = "Choose the mechanism file to add the sessions to.";
        } else if (records.isEmpty()) {
            problem = "Add at least one record.";
        } else {
            for (RecordChoice r : records) {
                if (r.error().isPresent()) {
                    problem = r.file().getFileName() + " cannot be read with this mapping: " + r.error().get();
                    break;
                }
            }
        }
        setErrorMessage(problem);
        setPageComplete(problem == null);
    }

    /** @return the mechanism file chosen */
    IFile mechanism() {
        return mechanism;
    }

    /** @return the records, each read with its mapping */
    List<RecordChoice> records() {
        return List.copyOf(records);
    }

    /** @return the chart of the selected record (for tests) */
    SwingChart chart() {
        return chart;
    }

    /**
     * Shows a message from Finish.
     *
     * @param message why the sessions were not added
     */
    void failed(String message) {
        setErrorMessage(message);
    }
}
