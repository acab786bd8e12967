package dev.penduline.ui.internal.problems;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.EObject;

import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.TestSession;
import dev.penduline.model.adapt.MechanismAdapter;
import dev.penduline.model.persistence.AtomicFileWrite;
import dev.penduline.model.persistence.MechanismFileException;
import dev.penduline.model.validation.MechanismRule;
import dev.penduline.model.validation.MechanismValidation;
import dev.penduline.records.PlainText;
import dev.penduline.services.InputException;
import dev.penduline.services.MechanismLoader;
import dev.penduline.services.SessionRecords;

/**
 * The problems of one mechanism file, as the command line finds them: a file that cannot be read
 * (with the loader's line), every error and warning of the mechanism's validation, each on the
 * element it names, and per test session a record that is missing, outside the project or
 * unreadable (an error: nothing can analyse or fit it) or whose content changed since it was
 * added (a warning: {@code fit} refuses it until told to accept it). Plain Java on the file
 * system, no workspace and no UI, so it runs in any thread.
 */
public final class MechanismProblems {

    /** How serious a problem is. */
    public enum Severity {
        /** Blocks a computation. */
        ERROR,
        /** Worth a look; nothing is blocked. */
        WARNING
    }

    /** The kind of model element a problem belongs to; the name in lower case is the marker's value. */
    public enum ElementKind {
        /** A part of the mechanism. */
        PART,
        /** A test session. */
        SESSION,
        /** A stored friction fit. */
        FIT,
        /** A friction hypothesis (or one of its terms). */
        HYPOTHESIS,
        /** The file as a whole: unreadable, or a rule of the whole mechanism. */
        FILE;

        /**
         * The value of the marker's element-kind attribute.
         *
         * @return the kind in lower case, e.g. {@code "part"}
         */
        public String value() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /**
     * One problem.
     *
     * @param severity  how serious it is
     * @param message   the message the command line gives (names the element; one printable line)
     * @param kind      the kind of element it belongs to
     * @param elementId the element's stable identifier in the file, or null for {@link ElementKind#FILE}
     * @param location  where it is, in words: {@code "part 'arm'"}, {@code "line 3"}, {@code "mechanism file"}
     * @param line      the 1-based line the loader reported, or 0 when it reported none
     */
    public record Problem(Severity severity, String message, ElementKind kind, String elementId, String location,
            int line) {
    }

    private MechanismProblems() {
    }

    /**
     * Finds the problems of a mechanism file.
     *
     * @param file the mechanism file
     * @return its problems, in the order of the file (load or validation first, then the records); empty when none
     */
    public static List<Problem> of(Path file) {
        Mechanism mechanism;
        try {
            mechanism = MechanismLoader.readMechanism(file);
        } catch (InputException e) {
            return List.of(unreadable(e));
        }
        List<Problem> out = new ArrayList<>();
        Set<TestSession> badPaths = new HashSet<>();
        collect(MechanismValidation.validate(mechanism), out, badPaths);
        for (TestSession s : mechanism.getSessions()) {
            // a path the validation refused (absolute, "..") is reported there; it leads nowhere to look
            if (!badPaths.contains(s) && s.getRecordPath() != null && !s.getRecordPath().isBlank()) {
                record(file, s).ifPresent(out::add);
            }
        }
        return out;
    }

    private static Problem unreadable(InputException e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof MechanismFileException m) {
                String where = m.line() > 0 ? "line " + m.line() + (m.column() > 0 ? ", column " + m.column() : "")
                        : "mechanism file";
                return new Problem(Severity.ERROR, "cannot be read: " + m.problem(), ElementKind.FILE, null, where,
                        m.line());
            }
        }
        return new Problem(Severity.ERROR, e.getMessage(), ElementKind.FILE, null, "mechanism file", 0);
    }

    /** The leaves of the diagnostic tree, each on the element its data names. */
    private static void collect(Diagnostic d, List<Problem> out, Set<TestSession> badPaths) {
        if (!d.getChildren().isEmpty()) {
            for (Diagnostic child : d.getChildren()) {
                collect(child, out, badPaths);
            }
            return;
        }
        if (d.getSeverity() < Diagnostic.WARNING) {
            return;
        }
        EObject subject = d.getData().isEmpty() || !(d.getData().get(0) instanceof EObject o) ? null : o;
        Problem p = onElement(d.getSeverity() >= Diagnostic.ERROR ? Severity.ERROR : Severity.WARNING, d.getMessage(),
                subject);
        out.add(p);
        if (MechanismRule.SOURCE.equals(d.getSource()) && d.getCode() == MechanismRule.RECORD_PATH.code()
                && subject instanceof TestSession s) {
            badPaths.add(s);
        }
    }

    /** A problem on the nearest part, session, fit or hypothesis that holds the subject; else on the file. */
    private static Problem onElement(Severity severity, String message, EObject subject) {
        for (EObject o = subject; o != null; o = o.eContainer()) {
            switch (o) {
                case Part p -> {
                    return new Problem(severity, message, ElementKind.PART, p.getId(),
                            "part '" + PlainText.visible(MechanismAdapter.label(p)) + "'", 0);
                }
                case TestSession s -> {
                    return new Problem(severity, message, ElementKind.SESSION, s.getId(), label("session", s.getName(),
                            s.getId()), 0);
                }
                case FitResult f -> {
                    return new Problem(severity, message, ElementKind.FIT, f.getId(), label("fit", f.getName(), f.getId()), 0);
                }
                case FrictionHypothesis h -> {
                    return new Problem(severity, message, ElementKind.HYPOTHESIS, h.getId(),
                            label("hypothesis", h.getName(), h.getId()), 0);
                }
                default -> {
                    // an estimate, a term or a setting: its holder is further up
                }
            }
        }
        return new Problem(severity, message, ElementKind.FILE, null, "mechanism file", 0);
    }

    /** The record of a session: missing, outside, not a file or unreadable is an error; changed is a warning. */
    private static Optional<Problem> record(Path file, TestSession s) {
        String where = label("session", s.getName(), s.getId());
        Path record;
        try {
            record = SessionRecords.recordFile(file, s);
        } catch (InputException e) {
            return Optional.of(new Problem(Severity.ERROR, e.getMessage(), ElementKind.SESSION, s.getId(), where, 0));
        }
        try {
            return SessionRecords.changeOf(s, SessionRecords.sha256(record)).map(change -> new Problem(Severity.WARNING,
                    change + "; a fit refuses it until the record is restored or its new content accepted"
                    + " (--accept-changed-records)", ElementKind.SESSION, s.getId(),
                    where, 0));
        } catch (IOException e) {
            return Optional.of(new Problem(Severity.ERROR, where + ": " + PlainText.visible(s.getRecordPath())
                    + " cannot be read (" + AtomicFileWrite.reason(e) + ")", ElementKind.SESSION, s.getId(), where, 0));
        }
    }

    private static String label(String kind, String name, String id) {
        String shown = name != null && !name.isBlank() ? name : id != null && !id.isBlank() ? id : "(unnamed)";
        return kind + " '" + PlainText.visible(shown) + "'";
    }
}
