package dev.rootform.symbolic.algebra;

import dev.rootform.symbolic.work.Deadline;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.TreeMap;

/**
 * A polynomial with rational coefficients in named variables (the parameters, and for a
 * characteristic polynomial also the root variable as the last one). Immutable and canonical: no
 * zero coefficients are stored, so {@link #equals} is equality of polynomials over the same names.
 *
 * @since 0.3
 */
public final class ParamPolynomial {
    private final List<String> names;
    /** Coefficient by monomial, highest total degree first; never a zero coefficient. */
    private final TreeMap<Monomial, Rational> terms;

    private ParamPolynomial(List<String> names, TreeMap<Monomial, Rational> terms) {
        this.names = names;
        this.terms = terms;
    }

    /** The constant {@code c} in the variables {@code names}. */
    public static ParamPolynomial constant(List<String> names, Rational c) {
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        if (!c.isZero()) {
            t.put(Monomial.one(names.size()), c);
        }
        return new ParamPolynomial(List.copyOf(names), t);
    }

    /** The variable {@code names.get(index)}. */
    public static ParamPolynomial variable(List<String> names, int index) {
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        t.put(Monomial.variable(names.size(), index), Rational.ONE);
        return new ParamPolynomial(List.copyOf(names), t);
    }

    /** A polynomial from exponent vectors and their coefficients (zeros are dropped). */
    static ParamPolynomial of(List<String> names, Map<Monomial, Rational> coefficients) {
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        coefficients.forEach((m, c) -> {
            if (m.size() != names.size()) {
                throw new IllegalArgumentException("monomial of " + m.size() + " variables in a ring of " + names.size());
            }
            if (!c.isZero()) {
                t.merge(m, c, Rational::add);
                if (t.get(m).isZero()) {
                    t.remove(m);
                }
            }
        });
        return new ParamPolynomial(List.copyOf(names), t);
    }

    /** The terms as exponent vectors (copies) with their coefficients, for the backend's conversions. */
    public List<Map.Entry<int[], Rational>> exponentVectors() {
        return terms.entrySet().stream().map(e -> Map.entry(e.getKey().exponents(), e.getValue())).toList();
    }

    /** The polynomial Σ c·x^e from exponent vectors, for the backend's conversions. */
    public static ParamPolynomial fromExponents(List<String> names, List<Map.Entry<int[], Rational>> terms) {
        Map<Monomial, Rational> map = new java.util.HashMap<>();
        for (Map.Entry<int[], Rational> t : terms) {
            map.merge(new Monomial(t.getKey()), t.getValue(), Rational::add);
        }
        return of(names, map);
    }

    public List<String> names() {
        return names;
    }

    Map<Monomial, Rational> terms() {
        return Collections.unmodifiableMap(terms);
    }

    public boolean isZero() {
        return terms.isEmpty();
    }

    /** True when no variable occurs. */
    public boolean isConstant() {
        return terms.isEmpty() || terms.size() == 1 && terms.firstKey().degree() == 0;
    }

    /** The value of a constant polynomial. @throws IllegalStateException if a variable occurs */
    public Rational constantValue() {
        if (!isConstant()) {
            throw new IllegalStateException(this + " is not constant");
        }
        return terms.isEmpty() ? Rational.ZERO : terms.firstEntry().getValue();
    }

    /** The coefficient of the first term in the canonical order (highest total degree, then lexicographic). */
    public Rational leadingCoefficient() {
        return terms.isEmpty() ? Rational.ZERO : terms.firstEntry().getValue();
    }

    /** The highest exponent of variable {@code index}; -1 for the zero polynomial. */
    public int degreeIn(int index) {
        return terms.keySet().stream().mapToInt(m -> m.exponent(index)).max().orElse(-1);
    }

    /** The total degree; -1 for the zero polynomial. */
    public int totalDegree() {
        return terms.keySet().stream().mapToInt(Monomial::degree).max().orElse(-1);
    }

    /** True when variable {@code index} occurs. */
    public boolean involves(int index) {
        return degreeIn(index) > 0;
    }

    /** The coefficient of variable {@code index} to the power {@code power}, as a polynomial in the same names. */
    public ParamPolynomial coefficientOf(int index, int power) {
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        terms.forEach((m, c) -> {
            if (m.exponent(index) == power) {
                t.put(m.with(index, 0), c);
            }
        });
        return new ParamPolynomial(names, t);
    }

    public ParamPolynomial add(ParamPolynomial other) {
        requireSameNames(other);
        TreeMap<Monomial, Rational> t = new TreeMap<>(terms);
        other.terms.forEach((m, c) -> {
            Rational sum = t.getOrDefault(m, Rational.ZERO).add(c);
            if (sum.isZero()) {
                t.remove(m);
            } else {
                t.put(m, sum);
            }
        });
        return new ParamPolynomial(names, t);
    }

    public ParamPolynomial negate() {
        return scale(Rational.MINUS_ONE);
    }

    public ParamPolynomial subtract(ParamPolynomial other) {
        return add(other.negate());
    }

    public ParamPolynomial scale(Rational factor) {
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        if (!factor.isZero()) {
            terms.forEach((m, c) -> t.put(m, c.multiply(factor)));
        }
        return new ParamPolynomial(names, t);
    }

    public ParamPolynomial multiply(ParamPolynomial other) {
        requireSameNames(other);
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        for (Map.Entry<Monomial, Rational> a : terms.entrySet()) {
            Deadline.checkCurrent();
            for (Map.Entry<Monomial, Rational> b : other.terms.entrySet()) {
                Monomial m = a.getKey().times(b.getKey());
                Rational sum = t.getOrDefault(m, Rational.ZERO).add(a.getValue().multiply(b.getValue()));
                if (sum.isZero()) {
                    t.remove(m);
                } else {
                    t.put(m, sum);
                }
            }
        }
        return new ParamPolynomial(names, t);
    }

    public ParamPolynomial pow(int exponent) {
        if (exponent < 0) {
            throw new IllegalArgumentException("exponent (" + exponent + ") must be >= 0");
        }
        ParamPolynomial result = constant(names, Rational.ONE);
        for (int i = 0; i < exponent; i++) {
            result = result.multiply(this);
        }
        return result;
    }

    /** The value at {@code values} (one rational per variable, by name). @throws IllegalArgumentException if a variable is missing */
    public Rational evaluate(Map<String, Rational> values) {
        Rational sum = Rational.ZERO;
        for (Map.Entry<Monomial, Rational> e : terms.entrySet()) {
            Rational term = e.getValue();
            for (int i = 0; i < names.size(); i++) {
                int power = e.getKey().exponent(i);
                if (power > 0) {
                    Rational v = values.get(names.get(i));
                    if (v == null) {
                        throw new IllegalArgumentException("no value for " + names.get(i));
                    }
                    term = term.multiply(v.pow(power));
                }
            }
            sum = sum.add(term);
        }
        return sum;
    }

    /** The same polynomial over the variables {@code target}, which must contain every variable that occurs. */
    public ParamPolynomial over(List<String> target) {
        TreeMap<Monomial, Rational> t = new TreeMap<>();
        terms.forEach((m, c) -> {
            int[] e = new int[target.size()];
            for (int i = 0; i < names.size(); i++) {
                if (m.exponent(i) > 0) {
                    int j = target.indexOf(names.get(i));
                    if (j < 0) {
                        throw new IllegalArgumentException(names.get(i) + " is not among " + target);
                    }
                    e[j] = m.exponent(i);
                }
            }
            t.put(new Monomial(e), c);
        });
        return new ParamPolynomial(List.copyOf(target), t);
    }

    private void requireSameNames(ParamPolynomial other) {
        if (!names.equals(other.names)) {
            throw new IllegalArgumentException("variables differ: " + names + " and " + other.names);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ParamPolynomial p && names.equals(p.names) && terms.equals(p.terms);
    }

    @Override
    public int hashCode() {
        return Objects.hash(names, terms);
    }

    /** Plain text such as {@code c^2 - 4·k·m}: terms by falling total degree, products with a middle dot. */
    @Override
    public String toString() {
        if (terms.isEmpty()) {
            return "0";
        }
        StringBuilder text = new StringBuilder();
        for (Map.Entry<Monomial, Rational> e : terms.entrySet()) {
            Rational c = e.getValue();
            String power = powerProduct(e.getKey());
            if (text.length() == 0) {
                text.append(c.signum() < 0 ? "-" : "");
            } else {
                text.append(c.signum() < 0 ? " - " : " + ");
            }
            Rational a = c.abs();
            if (power.isEmpty()) {
                text.append(a);
            } else if (a.isOne()) {
                text.append(power);
            } else {
                text.append(a.isInteger() ? a.toString() : "(" + a + ")").append('·').append(power);
            }
        }
        return text.toString();
    }

    private String powerProduct(Monomial m) {
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < names.size(); i++) {
            int e = m.exponent(i);
            if (e > 0) {
                text.append(text.length() == 0 ? "" : "·").append(names.get(i)).append(e == 1 ? "" : "^" + e);
            }
        }
        return text.toString();
    }
}
