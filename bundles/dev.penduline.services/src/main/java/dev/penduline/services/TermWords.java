package dev.penduline.services;

import java.util.Optional;

import dev.penduline.physics.identify.FrictionTerm;
import dev.penduline.physics.units.Unit;

/**
 * How the Friction view names the stored terms and parameters: the stored identifiers are the
 * physics layer's term names in lower case ("viscous", "coulomb", ...) and its parameter
 * symbols (b, Tc, Ts, c, J0); the units come from the physics layer's {@link FrictionTerm}.
 */
public final class TermWords {

    /** The symbol of the pivot inertia among the stored estimates. */
    public static final String INERTIA_SYMBOL = "J0";

    private TermWords() {
    }

    /**
     * The word for a stored term identifier.
     *
     * @param termId "viscous", "coulomb", "stiction" or "drag"
     * @return "viscous", "Coulomb", "stiction", "drag" (the identifier itself when unknown)
     */
    public static String word(String termId) {
        return "coulomb".equals(termId) ? "Coulomb" : String.valueOf(termId);
    }

    /**
     * What a parameter symbol stands for.
     *
     * @param symbol b, Tc, Ts, c or J0
     * @return its name in the trade's words
     */
    public static String quantity(String symbol) {
        return term(symbol).map(t -> word(t.word())).orElse(symbol);
    }

    /**
     * The SI unit of a parameter.
     *
     * @param symbol b, Tc, Ts, c or J0
     * @return the unit text, empty when unknown
     */
    public static String unit(String symbol) {
        if (INERTIA_SYMBOL.equals(symbol)) {
            return Unit.KG_M2.symbol();
        }
        return term(symbol).map(FrictionTerm::unit).orElse("");
    }

    private static Optional<FrictionTerm> term(String symbol) {
        for (FrictionTerm t : FrictionTerm.values()) {
            if (t.symbol().equals(symbol)) {
                return Optional.of(t);
            }
        }
        return Optional.empty();
    }
}
