package dev.penduline.ui.tests;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.eclipse.core.resources.IFile;
import org.eclipse.e4.ui.workbench.modeling.EPartService.PartState;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.preference.PreferenceDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CLabel;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.eclipse.ui.dialogs.PreferencesUtil;

import dev.penduline.services.Defaults;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.present.Figures;
import dev.penduline.ui.PendulineViews;
import dev.penduline.ui.internal.MechanismSelection;
import dev.penduline.ui.internal.mechanism.InertiaTotal;
import dev.penduline.ui.internal.mechanism.MechanismPart;
import dev.penduline.ui.internal.mechanism.MechanismSheet;
import dev.penduline.ui.internal.preferences.PendulinePreferencePage;
import dev.penduline.ui.internal.preferences.WorkbenchDefaults;
import dev.penduline.ui.internal.wizard.MechanismProjectCreation;

/**
 * Window › Preferences › Penduline in the live workbench: the page shows the defaults in use,
 * a value typed into its field and Apply or OK reach the per-user defaults file (here in a
 * temporary folder, through the {@value Defaults#CONFIG_DIR_PROPERTY} seam) and the workbench
 * (display precision, gravity of a new mechanism); a bad value shows the page's error naming the
 * key, disables OK and Apply, and writes nothing. A new mechanism project then has the user's
 * gravity and the Mechanism view shows its period to the user's digits.
 */
final class PreferencesCapability implements Capability {

    /** INVENTED test part: a 2 kg point mass 0.5 m below the pivot axis. */
    private static final String BOB = """
            # INVENTED test data for the workbench test, not a real product.
            name,shape,mass_kg,x_m,y_m,z_m
            bob,point,2,0,-0.5,0
            """;

    @Override
    public void run(WorkbenchDriver driver) throws Exception {
        String before = System.getProperty(Defaults.CONFIG_DIR_PROPERTY);
        Path config = Files.createTempDirectory("penduline-preferences-test");
        System.setProperty(Defaults.CONFIG_DIR_PROPERTY, config.toString());
        try {
            drive(driver, config.resolve(Defaults.FILE_NAME));
        } finally {
            if (before == null) {
                System.clearProperty(Defaults.CONFIG_DIR_PROPERTY);
            } else {
                System.setProperty(Defaults.CONFIG_DIR_PROPERTY, before);
            }
            WorkbenchDefaults.reload();
        }
        assertEquals(Figures.DEFAULT_DIGITS, Figures.digits(), "the test leaves the display precision as it found it");
    }

    private static void drive(WorkbenchDriver driver, Path file) throws Exception {
        assertEquals(file, Defaults.location());
        WorkbenchDefaults.reload();
        assertFalse(Files.exists(file), "a fresh folder");
        PreferenceDialog dialog = PreferencesUtil.createPreferenceDialogOn(driver.shell(), PendulinePreferencePage.ID,
                new String[] {PendulinePreferencePage.ID}, null);
        assertNotNull(dialog, "no preference dialog for " + PendulinePreferencePage.ID);
        dialog.setBlockOnOpen(false);
        dialog.open();
        placed(driver, dialog);
        PendulinePreferencePage page = (PendulinePreferencePage) dialog.getSelectedPage();
        assertNotNull(page, "the Penduline page is not shown");
        Composite root = dialog.getShell();
        Text gravity = field(root, "Gravity for new mechanisms");
        Text resamples = field(root, "Resamples of a fit");
        Text digits = field(root, "Significant digits shown");
        assertEquals("9.80665", gravity.getText(), "the page shows the built-in gravity");
        assertEquals("40", resamples.getText());
        assertEquals("4", digits.getText());
        assertTrue(visible(root, file.toString()), "the page names its file");
        assertNull(page.getErrorMessage(), "an error on a page of good values");
        assertTrue(okButton(root).isEnabled(), "OK is disabled on a page of good values");
        shot(driver, dialog, "preferences.png");

        type(driver, resamples, "12");
        type(driver, digits, "6");
        press(driver, button(root, "Apply"));
        assertTrue(Files.isRegularFile(file), "Apply wrote no file");
        Defaults saved = Defaults.read(file);
        assertEquals(12, saved.resamples(), "resamples in the file");
        assertEquals(6, saved.significantDigits(), "digits in the file");
        assertEquals(9.80665, saved.gravity(), "gravity untouched");
        assertEquals(saved, WorkbenchDefaults.current(), "the workbench uses what was saved");
        assertEquals(6, Figures.digits(), "the display precision follows at once");
        assertEquals("3.14159", Figures.significant(Math.PI));
        byte[] applied = Files.readAllBytes(file);
        shot(driver, dialog, "preferences-applied.png");

        type(driver, gravity, "0");
        String error = page.getErrorMessage();
        assertNotNull(error, "no error for gravity 0");
        assertTrue(error.startsWith("gravity_m_s2: '0' is out of range: give a value above 0 and at most 100 m/s²"), error);
        assertTrue(visible(root, error), "the whole error is not shown in the dialog's message line");
        Button ok = okButton(root);
        Button apply = button(root, "Apply");
        assertFalse(ok.isEnabled(), "OK must be disabled while a value is bad");
        assertFalse(apply.isEnabled(), "Apply must be disabled while a value is bad");
        shot(driver, dialog, "preferences-bad-value.png");
        assertArrayEquals(applied, Files.readAllBytes(file), "a bad value wrote something");

        type(driver, gravity, "abc");
        assertTrue(page.getErrorMessage().startsWith("gravity_m_s2: 'abc' is not a number"), page.getErrorMessage());
        type(driver, gravity, "9.81");
        assertNull(page.getErrorMessage(), "the error stays after a good value");
        assertTrue(ok.isEnabled(), "OK stays disabled after a good value");
        press(driver, ok);
        driver.waitFor("the preference dialog to close", () -> dialog.getShell() == null || dialog.getShell().isDisposed()
                ? Boolean.TRUE : null);
        saved = Defaults.read(file);
        assertEquals(new Defaults(9.81, 15, 1, 12, 6), saved, "the file after OK");
        assertEquals(saved, WorkbenchDefaults.current());

        // a new mechanism project takes the user's gravity, and the Mechanism view shows it to the user's digits
        Path csv = Files.writeString(Files.createTempDirectory("penduline-preferences-parts").resolve("bob.csv"), BOB);
        IFile made = MechanismProjectCreation.create("preferences-bob", "Preferences bob (invented)", Optional.of(csv), null)
                .mechanismFile();
        assertEquals(9.81, MechanismLoader.readMechanism(MechanismSelection.pathOf(made)).getGravity(), "gravity of a new mechanism");
        driver.reveal(made);
        MechanismPart view = (MechanismPart) driver.part(PendulineViews.MECHANISM).getObject();
        MechanismSheet sheet = driver.waitFor("the Mechanism view to show the new mechanism", () -> {
            MechanismSheet s = view.sheet();
            return s != null && "Preferences bob (invented)".equals(s.title())
                    && s.shown(InertiaTotal.SMALL_ANGLE_PERIOD).isPresent() ? s : null;
        });
        String period = sheet.shown(InertiaTotal.SMALL_ANGLE_PERIOD).orElseThrow();
        // a point mass 0.5 m below the axis is a simple pendulum: T0 = 2π √(L/g) (any mechanics textbook)
        assertEquals(6, new BigDecimal(period).precision(), "six significant digits in the view: " + period);
        assertEquals(2 * Math.PI * Math.sqrt(0.5 / 9.81), Double.parseDouble(period), 0.5e-5, "T0 with the user's gravity");
        driver.parts().showPart(PendulineViews.MECHANISM, PartState.ACTIVATE);
        driver.shot(driver.shell(), "preferences-mechanism.png");
        try (var left = Files.list(file.getParent())) {
            assertEquals(List.of(file), left.toList(), "only the defaults file: no temporary file is left");
        }
    }

    /**
     * A screenshot of the dialog as it is now: its pending paints done, and time for the X server
     * to show them (a screenshot copies the screen, which otherwise may still show an older frame).
     */
    private static void shot(WorkbenchDriver driver, PreferenceDialog dialog, String name) throws Exception {
        dialog.getShell().redraw(0, 0, dialog.getShell().getSize().x, dialog.getShell().getSize().y, true);
        dialog.getShell().update();
        placed(driver, dialog);
        driver.shot(dialog.getShell(), name);
    }

    /** Waits until the window manager has placed the dialog (a screenshot copies its place on the screen). */
    private static void placed(WorkbenchDriver driver, PreferenceDialog dialog) throws InterruptedException {
        Rectangle[] last = {null};
        int[] still = {0};
        driver.waitFor("the preference dialog to stay in place", () -> {
            Rectangle now = dialog.getShell().getBounds();
            still[0] = now.equals(last[0]) ? still[0] + 1 : 0;
            last[0] = now;
            // unchanged over 20 looks of the event loop (at least 0.2 s when nothing happens)
            return still[0] >= 20 ? now : null;
        });
    }

    /** Replaces a field's text, as typing or pasting into it does (the field checks on every change). */
    private static void type(WorkbenchDriver driver, Text text, String value) {
        text.setFocus();
        text.setText(value);
        Event up = new Event();
        up.character = value.isEmpty() ? 0 : value.charAt(value.length() - 1);
        text.notifyListeners(SWT.KeyUp, up);
        driver.flush();
    }

    /** Presses a button as a click does: only an enabled button can be pressed. */
    private static void press(WorkbenchDriver driver, Button button) {
        assertTrue(button.isEnabled(), "'" + button.getText() + "' is disabled");
        button.notifyListeners(SWT.Selection, new Event());
        driver.flush();
    }

    private static Text field(Composite root, String label) {
        for (Control c : descendants(root)) {
            if (c instanceof Label l && l.getText().replace("&", "").startsWith(label)) {
                Control[] siblings = l.getParent().getChildren();
                for (int i = 0; i < siblings.length - 1; i++) {
                    if (siblings[i] == l && siblings[i + 1] instanceof Text t) {
                        return t;
                    }
                }
            }
        }
        throw new AssertionError("no field labelled '" + label + "'");
    }

    private static Button button(Composite root, String label) {
        for (Control c : descendants(root)) {
            if (c instanceof Button b && b.getText().replace("&", "").equals(label)) {
                return b;
            }
        }
        throw new AssertionError("no button '" + label + "'");
    }

    private static Button okButton(Composite root) {
        for (Control c : descendants(root)) {
            if (c instanceof Button b && Integer.valueOf(IDialogConstants.OK_ID).equals(b.getData())) {
                return b;
            }
        }
        throw new AssertionError("no OK button");
    }

    /** Whether a shown label or text of the dialog holds a fragment. */
    private static boolean visible(Composite root, String fragment) {
        for (Control c : descendants(root)) {
            String shown = c instanceof Label l ? l.getText() : c instanceof CLabel k ? k.getText()
                    : c instanceof Text t ? t.getText() : null;
            if (shown != null && shown.contains(fragment) && c.isVisible()) {
                return true;
            }
        }
        return false;
    }

    private static List<Control> descendants(Composite root) {
        List<Control> all = new ArrayList<>();
        for (Control c : root.getChildren()) {
            all.add(c);
            if (c instanceof Composite k) {
                all.addAll(descendants(k));
            }
        }
        return all;
    }
}
