package dev.penduline.model.adapt;

import dev.penduline.model.FrictionKind;
import dev.penduline.physics.identify.FrictionTerm;

/**
 * The mechanism file's kinds of friction term and the physics layer's terms: the same four, with
 * the same words, so a kind's unit and symbol come from {@link FrictionTerm}.
 */
public final class FrictionKinds {

    private FrictionKinds() {
    }

    /**
     * The physics layer's term of a kind.
     *
     * @param kind the kind in the mechanism file
     * @return the term of the same word
     */
    public static FrictionTerm term(FrictionKind kind) {
        return FrictionTerm.valueOf(kind.getName());
    }

    /**
     * The kind of a physics layer's term.
     *
     * @param term the term
     * @return the kind of the same word
     */
    public static FrictionKind kind(FrictionTerm term) {
        return FrictionKind.getByName(term.name());
    }
}
