package dev.rootform.symbolic.claim;

import java.util.Map;
import java.util.TreeMap;

/**
 * A claim in exact form, as checked: the formula, the first index it is claimed for (sequences;
 * {@link Long#MIN_VALUE} for functions and for a sequence claimed from the problem's first index),
 * and the values claimed one by one. Slips are candidates too: the claim with one mistake undone.
 *
 * @param formula the formula
 * @param from the first index of the formula
 * @param values index → value, for values claimed one by one
 */
record Candidate(ExpSum formula, long from, Map<Long, ExactValue> values) {
    Candidate {
        values = java.util.Collections.unmodifiableMap(new TreeMap<>(values));
    }

    /** The same claim with another formula. */
    Candidate with(ExpSum other) {
        return new Candidate(other, from, values);
    }

    /** The claimed value at index n: a value claimed on its own, else the formula's from its first index on, else none. */
    ExactValue at(long n) {
        ExactValue v = values.get(n);
        if (v != null) {
            return v;
        }
        return n >= from ? formula.valueAt(n) : null;
    }

    /** The largest index claimed on its own, or {@link Long#MIN_VALUE}. */
    long lastValue() {
        return values.keySet().stream().mapToLong(Long::longValue).max().orElse(Long.MIN_VALUE);
    }
}
