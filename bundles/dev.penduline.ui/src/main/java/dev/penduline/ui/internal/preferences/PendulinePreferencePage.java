package dev.penduline.ui.internal.preferences;

import java.io.IOException;

import org.eclipse.jface.dialogs.IMessageProvider;
import org.eclipse.jface.preference.FieldEditorPreferencePage;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.ui.IWorkbench;
import org.eclipse.ui.IWorkbenchPreferencePage;

import dev.penduline.services.Defaults;
import dev.penduline.services.Defaults.Key;

/**
 * Window › Preferences › Penduline: the defaults a user sets once (gravity of new mechanisms,
 * the fit's verdict margin and resamples, the settle band, the significant digits shown). They
 * are kept in the per-user defaults file that the command line reads with
 * {@code --use-preferences}; OK and Apply write it atomically, a bad value is refused with the
 * key and the accepted range and nothing is written.
 */
public final class PendulinePreferencePage extends FieldEditorPreferencePage implements IWorkbenchPreferencePage {

    /** The page's id in {@code org.eclipse.ui.preferencePages}. */
    public static final String ID = "dev.penduline.ui.preferences";

    private DefaultsStore store;

    /** The page, its fields in one column. */
    public PendulinePreferencePage() {
        super(GRID);
    }

    @Override
    public void init(IWorkbench workbench) {
        store = new DefaultsStore();
        store.load();
        setPreferenceStore(store);
        setDescription("Defaults for the workbench and for 'penduline --use-preferences', kept in\n" + store.file());
    }

    @Override
    protected void createFieldEditors() {
        Composite parent = getFieldEditorParent();
        addField(new DefaultsFieldEditor(Key.GRAVITY, "&Gravity for new mechanisms (m/s²):", parent));
        addField(new DefaultsFieldEditor(Key.VERDICT_MARGIN, "&Verdict margin of a fit (percentage points):", parent));
        addField(new DefaultsFieldEditor(Key.SETTLE_BAND, "&Settle band, half-width (°):", parent));
        addField(new DefaultsFieldEditor(Key.RESAMPLES, "&Resamples of a fit (bootstrap refits):", parent));
        addField(new DefaultsFieldEditor(Key.SIGNIFICANT_DIGITS, "Significant &digits shown:", parent));
        Label note = new Label(parent, SWT.WRAP);
        note.setText("Standard gravity is 9.80665 m/s²; a mechanism file keeps the gravity it was made with. "
                + "An uncertainty is always shown to two digits. Views show a new precision when they next update.");
        GridData data = new GridData(SWT.FILL, SWT.TOP, true, false, 2, 1);
        // wide enough for a field's error (key, typed value and range) in the dialog's message line
        data.widthHint = 720;
        note.setLayoutData(data);
    }

    @Override
    protected void initialize() {
        super.initialize();
        WorkbenchDefaults.problem().ifPresent(p -> setMessage(p + ": the built-in defaults are in use; saving this page"
                + " replaces the file", IMessageProvider.WARNING));
    }

    @Override
    public boolean performOk() {
        if (!super.performOk()) {
            return false;
        }
        try {
            store.save();
        } catch (IOException e) {
            setErrorMessage(e.getMessage());
            return false;
        }
        setMessage(null);
        return true;
    }

    @Override
    protected void performDefaults() {
        super.performDefaults();
        setMessage("The built-in defaults (" + Defaults.BUILT_IN.text().lines().filter(l -> !l.startsWith("#"))
                .reduce((a, b) -> a + ", " + b).orElse("") + "); OK or Apply saves them", IMessageProvider.INFORMATION);
    }
}
