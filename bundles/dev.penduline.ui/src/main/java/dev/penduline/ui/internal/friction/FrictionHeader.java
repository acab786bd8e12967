package dev.penduline.ui.internal.friction;

import java.util.List;
import java.util.function.IntConsumer;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;

import dev.penduline.services.StoredFitText;

/**
 * The top of the Friction view: the mechanism's name and file, the list of stored fits, the
 * "Fit Friction…" button, and one line that says what is going on (how long a fit takes, its
 * progress, its outcome, or an error in red).
 */
final class FrictionHeader {

    /** How the line under the list reads. */
    enum Tone {
        /** A hint, in grey. */
        HINT,
        /** Progress or an outcome. */
        NEWS,
        /** Something went wrong, in red. */
        ERROR
    }

    private final Label title;
    private final Label source;
    private final Combo choice;
    private final Button fitButton;
    private final Label message;

    FrictionHeader(Composite parent, IntConsumer chosen, Runnable fit) {
        Composite names = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(12, 0).applyTo(names);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(names);
        title = new Label(names, SWT.NONE);
        title.setFont(JFaceResources.getHeaderFont());
        title.setText("No mechanism selected");
        source = new Label(names, SWT.NONE);
        source.setForeground(parent.getDisplay().getSystemColor(SWT.COLOR_WIDGET_DARK_SHADOW));
        GridDataFactory.fillDefaults().grab(true, false).align(SWT.FILL, SWT.END).applyTo(source);
        // The list, the button and the line that says what is going on share one row: the view
        // is short in the perspective and the estimates need the height.
        Composite bar = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(4).spacing(8, 0).applyTo(bar);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(bar);
        new Label(bar, SWT.NONE).setText("Stored fit:");
        choice = new Combo(bar, SWT.READ_ONLY | SWT.DROP_DOWN);
        choice.setEnabled(false);
        choice.addListener(SWT.Selection, e -> chosen.accept(choice.getSelectionIndex()));
        GridDataFactory.fillDefaults().align(SWT.BEGINNING, SWT.BEGINNING).applyTo(choice);
        fitButton = new Button(bar, SWT.PUSH);
        fitButton.setText("Fit Friction\u2026");
        fitButton.setToolTipText("Open the Friction Fit wizard: choose sessions and terms, fit with the same services"
                + " as 'penduline fit', and store the result in the file");
        fitButton.setEnabled(false);
        fitButton.addListener(SWT.Selection, e -> fit.run());
        GridDataFactory.fillDefaults().align(SWT.BEGINNING, SWT.BEGINNING).applyTo(fitButton);
        message = new Label(bar, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(200, SWT.DEFAULT).align(SWT.FILL, SWT.CENTER)
                .applyTo(message);
    }

    /**
     * Names the file shown.
     *
     * @param name  the mechanism's name (or the file name until it is read)
     * @param where the file's workspace path
     */
    void file(String name, String where) {
        title.setText(name);
        // Only the file name beside the title; the whole path in the tooltips, so that the
        // list and the button keep their room in a narrow view.
        source.setText(where.substring(where.lastIndexOf('/') + 1));
        title.setToolTipText(where);
        source.setToolTipText(where);
        title.getParent().layout(true);
    }

    /**
     * Lists the stored fits.
     *
     * @param fits   the fits, most recent first
     * @param chosen the one shown (null when there is none)
     */
    void fits(List<StoredFitText> fits, StoredFitText chosen) {
        choice.removeAll();
        for (int i = 0; i < fits.size(); i++) {
            choice.add(fits.get(i).label() + (i == 0 ? "  (latest)" : ""));
        }
        if (fits.isEmpty()) {
            choice.add("(none stored)");
        }
        choice.select(chosen == null ? 0 : Math.max(0, fits.indexOf(chosen)));
        choice.setEnabled(fits.size() > 1);
        choice.getParent().layout(true, true);
    }

    /**
     * Picks an entry of the list as the user would.
     *
     * @param index the entry (0: the most recent)
     */
    void choose(int index) {
        choice.select(index);
        choice.notifyListeners(SWT.Selection, new Event());
    }

    /**
     * Says what is going on.
     *
     * @param text the line
     * @param tone how it reads
     */
    void say(String text, Tone tone) {
        message.setText(text);
        message.setForeground(switch (tone) {
            case HINT -> message.getDisplay().getSystemColor(SWT.COLOR_WIDGET_DARK_SHADOW);
            case NEWS -> null;
            case ERROR -> message.getDisplay().getSystemColor(SWT.COLOR_DARK_RED);
        });
        message.getParent().getParent().layout(true, true);
    }

    /**
     * Enables or disables the button.
     *
     * @param enabled whether a fit can be started
     */
    void fitEnabled(boolean enabled) {
        fitButton.setEnabled(enabled);
    }

    /**
     * The line under the list, for tests.
     *
     * @return its text
     */
    String message() {
        return message.getText();
    }

    /**
     * The button, for tests.
     *
     * @return the "Fit Friction…" button
     */
    Button fitButton() {
        return fitButton;
    }

    /**
     * Whether the widgets are gone.
     *
     * @return true once the view is closed
     */
    boolean isDisposed() {
        return title.isDisposed();
    }
}
