package dev.penduline.model.naming;

import java.util.List;
import java.util.function.Function;
import java.util.stream.Collectors;

import dev.penduline.model.FitResult;
import dev.penduline.model.FrictionHypothesis;
import dev.penduline.model.FrictionKind;
import dev.penduline.model.FrictionTerm;
import dev.penduline.model.Mechanism;
import dev.penduline.model.Part;
import dev.penduline.model.PendulineFactory;
import dev.penduline.model.ShapeKind;
import dev.penduline.model.TestSession;

/**
 * Creates the elements users refer to, already named, given their stable identifier and added to
 * their container. Use these instead of the bare factory so that no element is saved without an
 * identifier.
 */
public final class NamedElements {

    private static final PendulineFactory FACTORY = PendulineFactory.eINSTANCE;

    private NamedElements() {
    }

    /**
     * A new mechanism with the defaults of the metamodel (z axis through the origin, gravity
     * along −y, standard g).
     *
     * @param name the mechanism's name
     * @return the mechanism, not yet in a resource
     */
    public static Mechanism mechanism(String name) {
        final Mechanism m = FACTORY.createMechanism();
        m.setName(name);
        return m;
    }

    /**
     * Adds a part: a point mass (written explicitly) until its shape is set.
     *
     * @param mechanism the mechanism
     * @param name      the part's name
     * @return the new part, last in the parts list
     */
    public static Part addPart(Mechanism mechanism, String name) {
        final Part p = FACTORY.createPart();
        p.setName(name);
        p.setShape(ShapeKind.POINT_MASS);
        p.setId(freeId(name, "part", mechanism.getParts(), Part::getId));
        mechanism.getParts().add(p);
        return p;
    }

    /**
     * Adds an empty friction hypothesis.
     *
     * @param mechanism the mechanism
     * @param name      the hypothesis' name
     * @return the new hypothesis
     */
    public static FrictionHypothesis addHypothesis(Mechanism mechanism, String name) {
        final FrictionHypothesis h = FACTORY.createFrictionHypothesis();
        h.setName(name);
        h.setId(freeId(name, "hypothesis", mechanism.getFrictionHypotheses(), FrictionHypothesis::getId));
        mechanism.getFrictionHypotheses().add(h);
        return h;
    }

    /**
     * Adds a free friction term, identified by its kind's literal ({@code viscous}, {@code coulomb},
     * {@code stiction}, {@code drag}).
     *
     * @param hypothesis the hypothesis
     * @param kind       the kind of term
     * @return the new term, lower bound 0, no value, no upper bound
     */
    public static FrictionTerm addTerm(FrictionHypothesis hypothesis, FrictionKind kind) {
        final FrictionTerm t = FACTORY.createFrictionTerm();
        t.setKind(kind);
        t.setId(freeId(kind.getLiteral(), "term", hypothesis.getTerms(), FrictionTerm::getId));
        hypothesis.getTerms().add(t);
        return t;
    }

    /**
     * Adds a test session pointing at a raw record file.
     *
     * @param mechanism  the mechanism
     * @param name       the session's name
     * @param recordPath the record file's path relative to the project folder, '/' separated
     * @return the new session
     */
    public static TestSession addSession(Mechanism mechanism, String name, String recordPath) {
        final TestSession s = FACTORY.createTestSession();
        s.setName(name);
        s.setRecordPath(recordPath);
        s.setId(freeId(name, "session", mechanism.getSessions(), TestSession::getId));
        mechanism.getSessions().add(s);
        return s;
    }

    /**
     * Adds an empty fit result.
     *
     * @param mechanism  the mechanism
     * @param name       the fit's name
     * @param computedAt when it was computed, ISO-8601 (e.g. {@code 2026-09-14T10:15:30Z})
     * @return the new fit result, last in the list
     */
    public static FitResult addFitResult(Mechanism mechanism, String name, String computedAt) {
        final FitResult f = FACTORY.createFitResult();
        f.setName(name);
        f.setComputedAt(computedAt);
        f.setId(freeId(name, "fit", mechanism.getFitResults(), FitResult::getId));
        mechanism.getFitResults().add(f);
        return f;
    }

    private static <T> String freeId(String name, String fallback, List<T> siblings, Function<T, String> id) {
        // a set: looking a candidate up in a list made adding n parts cost n³ when their names repeat
        return StableIds.unique(StableIds.slug(name, fallback), siblings.stream().map(id).collect(Collectors.toSet()));
    }
}
