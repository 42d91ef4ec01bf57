package dev.rootform.symbolic.params;

/** How an expression compares with zero in a condition. */
public enum Relation {
    POSITIVE(">"), NONNEGATIVE(">="), ZERO("="), NONZERO("≠"), NONPOSITIVE("<="), NEGATIVE("<");

    private final String symbol;

    Relation(String symbol) {
        this.symbol = symbol;
    }

    /** The comparison sign as written between the two sides. */
    public String symbol() {
        return symbol;
    }

    /** The relation of −p when p has this one. */
    public Relation negated() {
        switch (this) {
            case POSITIVE:
                return NEGATIVE;
            case NEGATIVE:
                return POSITIVE;
            case NONNEGATIVE:
                return NONPOSITIVE;
            case NONPOSITIVE:
                return NONNEGATIVE;
            default:
                return this;
        }
    }

    /** True when every number with relation {@code known} to zero also has this relation to zero. */
    public boolean follows(Relation known) {
        switch (this) {
            case POSITIVE:
                return known == POSITIVE;
            case NEGATIVE:
                return known == NEGATIVE;
            case NONNEGATIVE:
                return known == POSITIVE || known == NONNEGATIVE || known == ZERO;
            case NONPOSITIVE:
                return known == NEGATIVE || known == NONPOSITIVE || known == ZERO;
            case ZERO:
                return known == ZERO;
            default:
                return known == POSITIVE || known == NEGATIVE || known == NONZERO;
        }
    }

    /** True when no number has both relations to zero. */
    public boolean excludes(Relation other) {
        return !compatible(this, other);
    }

    private static boolean compatible(Relation a, Relation b) {
        for (int sign = -1; sign <= 1; sign++) {
            if (a.holdsFor(sign) && b.holdsFor(sign)) {
                return true;
            }
        }
        return false;
    }

    /** Whether a number of sign {@code sign} (−1, 0, 1) has this relation to zero. */
    public boolean holdsFor(int sign) {
        switch (this) {
            case POSITIVE:
                return sign > 0;
            case NONNEGATIVE:
                return sign >= 0;
            case ZERO:
                return sign == 0;
            case NONZERO:
                return sign != 0;
            case NONPOSITIVE:
                return sign <= 0;
            default:
                return sign < 0;
        }
    }
}
