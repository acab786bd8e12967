package dev.penduline.ui.internal.editor;

import java.time.Instant;
import java.time.temporal.ChronoUnit;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.edit.command.ChangeCommand;

import dev.penduline.model.Mechanism;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.physics.MechanismProperties;
import dev.penduline.services.PartsImport;
import dev.penduline.ui.internal.document.MechanismDocument;

/**
 * Changes of a mechanism document as single undoable commands. A change is any code that edits
 * the live model; EMF records what it did ({@link ChangeCommand}), so undo and redo restore
 * exactly that, however many objects it touched (an imported parts list, a reorder, a value).
 *
 * <p>A change of the parts that moves the mechanism's pivot inertia or gravity moment leaves the
 * fits stored before it stale: the same command marks each of them with the {@code stale}
 * setting the command line writes ({@link PartsImport#STALE}), saying when and how J0 moved, so
 * undo removes the mark with the change.
 */
public final class MechanismEdits {

    private MechanismEdits() {
    }

    /**
     * Runs a change of anything but the parts as one command.
     *
     * @param document the document
     * @param label    what the command is called in Undo/Redo (e.g. "Set gravity")
     * @param change   the edit of {@code document.mechanism()}
     * @return false when nothing could be executed
     */
    public static boolean run(MechanismDocument document, String label, Runnable change) {
        return document.execute(command(document.mechanism(), label, change, false));
    }

    /**
     * Runs a change of the parts as one command, marking the fits stored before stale when the
     * change moves J0, the gravity moment m·Lc or local gravity.
     *
     * @param document the document
     * @param label    what the command is called in Undo/Redo
     * @param change   the edit of the parts
     * @return false when nothing could be executed
     */
    public static boolean runOnParts(MechanismDocument document, String label, Runnable change) {
        return document.execute(command(document.mechanism(), label, change, true));
    }

    /**
     * The command of a change, not yet executed.
     *
     * @param mechanism the live model
     * @param label     the command's label
     * @param change    the edit
     * @param parts     whether it changes the parts (and may leave stored fits stale)
     * @return the command
     */
    static Command command(Mechanism mechanism, String label, Runnable change, boolean parts) {
        ChangeCommand c = new ChangeCommand(mechanism) {
            @Override
            protected void doExecute() {
                if (!parts || mechanism.getFitResults().isEmpty()) {
                    change.run();
                    return;
                }
                double[] before = moments(mechanism);
                change.run();
                double[] after = moments(mechanism);
                if (!same(before, after)) {
                    String stamp = Instant.now().truncatedTo(ChronoUnit.SECONDS).toString();
                    PartsImport.markFitsStale(mechanism, PartsImport.staleBecause("parts edited in the workbench", stamp,
                            label, before[0], after[0]), true);
                }
            }
        };
        c.setLabel(label);
        return c;
    }

    /** J0 and m·Lc of the parts and local gravity, NaN when the parts cannot be computed. */
    private static double[] moments(Mechanism m) {
        try {
            MechanismProperties p = MechanismAdapter.properties(m);
            return new double[] {p.pivotInertia(), p.mass() * p.centroidDistance(), m.getGravity()};
        } catch (IllegalArgumentException e) {
            return new double[] {Double.NaN, Double.NaN, m.getGravity()};
        }
    }

    private static boolean same(double[] a, double[] b) {
        for (int i = 0; i < a.length; i++) {
            boolean bothNaN = Double.isNaN(a[i]) && Double.isNaN(b[i]);
            if (!bothNaN && !(Math.abs(a[i] - b[i]) <= 1e-12 * Math.max(Math.abs(a[i]), Math.abs(b[i])))) {
                return false;
            }
        }
        return true;
    }
}
