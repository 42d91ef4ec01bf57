package dev.rootform.symbolic.recover;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * The shortest linear recurrence with constant rational coefficients that generates the given
 * terms x[start], x[start+1], …: x[n+L] = −Σ_{k&lt;L} a_k·x[n+k] with χ(λ) = λ^L + Σ_{k&lt;L} a_k λ^k.
 * It holds for every n from the first term on (n ≥ start) and is fixed by the first L terms.
 * When λ = 0 is a root of multiplicity m (a_0 = … = a_{m−1} = 0), the recurrence skips its m
 * lowest terms: the first m terms are exceptional and the sequence follows the reduced recurrence
 * of order L − m from x[start + m] on. Immutable.
 *
 * <p>An order-L recurrence fitted to N terms is determined by 2L of them (Massey 1969, see
 * {@link BerlekampMassey}); the N − 2L terms beyond confirm it, and at least two are required
 * before it is called recovered.
 *
 * @param terms the terms as given, x[start] first
 * @param start the index of the first term
 * @param characteristic χ, monic, of degree L ≥ 1
 * @since 0.2
 */
public record RecoveredRecurrence(List<Rational> terms, int start, RationalPolynomial characteristic) {
    /** Terms beyond 2L that a recovered recurrence of order L must have. */
    public static final int CONFIRMATIONS = 2;

    /** @throws IllegalArgumentException if χ is not monic of degree ≥ 1 */
    public RecoveredRecurrence {
        terms = List.copyOf(terms);
        Objects.requireNonNull(characteristic, "characteristic");
        if (characteristic.degree() < 1 || !characteristic.leadingCoefficient().isOne()) {
            throw new IllegalArgumentException("characteristic (" + characteristic + ") must be monic of degree >= 1");
        }
    }

    /** L, the order. */
    public int order() {
        return characteristic.degree();
    }

    /** m, the multiplicity of λ = 0 as a root of χ: the number of exceptional leading terms. */
    public int zeroRootMultiplicity() {
        return characteristic.zeroRootMultiplicity();
    }

    /** N, the number of terms the recurrence was fitted to (all of them). */
    public int termsUsed() {
        return terms.size();
    }

    /** N − 2L: the terms beyond the 2L that determine an order-L recurrence; negative when N &lt; 2L. */
    public int confirmingTerms() {
        return terms.size() - 2 * order();
    }

    /**
     * How many more terms the order found so far needs, 2L + 2 − N, or 0. A lower bound: more terms
     * can show a longer recurrence, which needs more still.
     */
    public int termsNeeded() {
        return Math.max(0, 2 * order() + CONFIRMATIONS - terms.size());
    }

    /** Whether at least {@link #CONFIRMATIONS} terms beyond 2L confirm the recurrence. */
    public boolean confirmed() {
        return termsNeeded() == 0;
    }

    /**
     * The index of the first term in {@link #text()}: {@code start}, except when the terms start
     * above 0 and λ = 0 is a root. Then the equation counts n from the first term (index 0), because
     * solve reads a recurrence as holding from n = 0 on, and nothing is known before the first
     * term.
     */
    public int equationStart() {
        return start > 0 && zeroRootMultiplicity() > 0 ? 0 : start;
    }

    /** The equation in solve's input syntax, solved for the highest term: {@code x[n+2] = x[n+1] + x[n]}. */
    public String equation() {
        return RecurrenceText.equation(characteristic);
    }

    /** The first L terms as conditions at their indices in {@link #text()}: {@code x[0] = 0}, …. */
    public List<String> conditions() {
        List<String> conditions = new ArrayList<>();
        for (int i = 0; i < order(); i++) {
            conditions.add(RecurrenceText.condition(equationStart() + i, terms.get(i)));
        }
        return List.copyOf(conditions);
    }

    /** Equation and conditions as one problem in solve's input syntax, separated by {@code ;}. */
    public String text() {
        return equation() + "; " + String.join("; ", conditions());
    }

    /**
     * The first {@code count} terms the recurrence generates from the first L given terms, by exact
     * rational iteration: the reference the recovery is checked against.
     */
    public List<Rational> iterate(int count) {
        int k = order();
        List<Rational> a = characteristic.coefficients();
        List<Rational> x = new ArrayList<>(terms.subList(0, Math.min(k, terms.size())));
        while (x.size() < count) {
            Deadline.checkCurrent();
            int m = x.size() - k;
            Rational sum = Rational.ZERO;
            for (int j = 0; j < k; j++) {
                sum = sum.subtract(a.get(j).multiply(x.get(m + j)));
            }
            x.add(sum);
        }
        return List.copyOf(x.subList(0, count));
    }
}
