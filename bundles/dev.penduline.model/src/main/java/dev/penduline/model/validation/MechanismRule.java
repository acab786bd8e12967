package dev.penduline.model.validation;

/**
 * The domain rules of a mechanism file. A diagnostic's {@code code} is the rule's
 * {@link #code()}, so that a user interface can offer a fix per rule.
 */
public enum MechanismRule {
    /** Every referable element has a non-empty identifier, unique among its siblings. */
    IDENTIFIER,
    /** An element the user sees has a name. */
    NAME,
    /** Gravity is positive. */
    GRAVITY,
    /** The pivot axis direction is non-zero and not parallel to the downward direction; |tilt| &lt; 90°. */
    AXIS,
    /** A part's mass (or density) is given once and positive; cut-outs too, they subtract. */
    MASS,
    /** The dimensions a part's shape needs are positive, and an inner radius is below the radius. */
    DIMENSION,
    /** Quantity is at least 1. */
    QUANTITY,
    /** Tolerances are finite and not negative. */
    TOLERANCE,
    /** Positions and angles are finite numbers. */
    POSITION,
    /** A given inertia tensor is positive semi-definite and obeys the triangle inequalities. */
    TENSOR,
    /** The whole mechanism is physical: positive total mass, J0 ≥ m·Lc² (inertia engine). */
    INERTIA,
    /** A friction term's value lies within its bounds, which are not negative; a fixed term has a value. */
    FRICTION_BOUNDS,
    /** Stiction is at least Coulomb friction; one term per kind. */
    FRICTION_SET,
    /** A session's record path is relative and stays inside the project folder. */
    RECORD_PATH,
    /** A session names its time and angle columns and the units needed to read them. */
    RECORD_COLUMNS,
    /** A session's content hash is a SHA-256 in hexadecimal. */
    RECORD_HASH,
    /** A fit's time is ISO-8601. */
    FIT_TIME,
    /** A fit's numbers are consistent (correlation matrix size and range, shares, errors). */
    FIT_NUMBERS,
    /** A fit refers to sessions, a hypothesis and terms that exist. */
    FIT_REFERENCE,
    /** No two sessions of a mechanism have one record (the same path, or the same content hash). */
    RECORD_DUPLICATE;

    /** Diagnostic source of every rule. */
    public static final String SOURCE = "dev.penduline.model";

    /**
     * The diagnostic code of this rule.
     *
     * @return a positive number, stable as long as the enum is only appended to
     */
    public int code() {
        return ordinal() + 1;
    }
}
