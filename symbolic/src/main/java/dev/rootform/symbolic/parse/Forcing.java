package dev.rootform.symbolic.parse;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * An exact sum of terms c · v^p · exponential · oscillation · π^q in one domain, closed under
 * addition and multiplication: exponentials combine, products of sines and cosines become sums.
 * The factor π^q only lives inside the argument of sin and cos while it is being read.
 */
final class Forcing {
    /**
     * The shape of one term; the coefficient is kept apart so that like terms add up. Equality and
     * hash are written out: the generic ones of a record were a tenth of reading a typical problem.
     */
    record Key(int power, Rational exponential, Oscillation oscillation, Rational frequency, boolean timesPi,
            int piPower) {
        @Override
        public boolean equals(Object o) {
            return o instanceof Key k && power == k.power && piPower == k.piPower && timesPi == k.timesPi
                    && oscillation == k.oscillation && exponential.equals(k.exponential) && frequency.equals(k.frequency);
        }

        @Override
        public int hashCode() {
            return ((((power * 31 + piPower) * 31 + (timesPi ? 1 : 0)) * 31 + oscillation.ordinal()) * 31
                    + exponential.hashCode()) * 31 + frequency.hashCode();
        }
    }

    /** A term that is linear in the variable: slope·v + intercept, all times π when {@code timesPi}. */
    record Linear(Rational slope, Rational intercept, boolean timesPi) { }

    private static final Comparator<Key> ORDER = Comparator.comparing(Key::exponential)
            .thenComparing(Key::oscillation).thenComparing(Key::timesPi).thenComparing(Key::frequency)
            .thenComparingInt(Key::power).thenComparingInt(Key::piPower);

    private final Domain domain;
    private final Map<Key, Rational> terms;

    private Forcing(Domain domain, Map<Key, Rational> terms) {
        this.domain = domain;
        this.terms = Map.copyOf(terms);
    }

    static Forcing zero(Domain domain) {
        return new Forcing(domain, Map.of());
    }

    static Forcing constant(Domain domain, Rational value) {
        return single(domain, 0, neutral(domain), Oscillation.NONE, Rational.ZERO, false, 0, value);
    }

    /** The independent variable v. */
    static Forcing variable(Domain domain) {
        return single(domain, 1, neutral(domain), Oscillation.NONE, Rational.ZERO, false, 0, Rational.ONE);
    }

    /** The constant π, allowed only inside sin and cos. */
    static Forcing pi(Domain domain) {
        return single(domain, 0, neutral(domain), Oscillation.NONE, Rational.ZERO, false, 1, Rational.ONE);
    }

    /** base^n (difference) or e^(rate·t) (differential). */
    static Forcing exponential(Domain domain, Rational value) {
        return single(domain, 0, value, Oscillation.NONE, Rational.ZERO, false, 0, Rational.ONE);
    }

    /** cos(ω·v) or sin(ω·v), with ω times π when {@code timesPi}. */
    static Forcing oscillation(Domain domain, Oscillation kind, Rational frequency, boolean timesPi) {
        return single(domain, 0, neutral(domain), kind, frequency, timesPi, 0, Rational.ONE);
    }

    private static Forcing single(Domain domain, int power, Rational exponential, Oscillation kind,
            Rational frequency, boolean timesPi, int piPower, Rational coefficient) {
        Map<Key, Rational> map = new LinkedHashMap<>();
        put(map, new Key(power, exponential, kind, frequency, timesPi, piPower), coefficient);
        return new Forcing(domain, map);
    }

    private static Rational neutral(Domain domain) {
        return domain == Domain.DIFFERENCE ? Rational.ONE : Rational.ZERO;
    }

    boolean isZero() {
        return terms.isEmpty();
    }

    /** The value if this is a constant (zero included). */
    Optional<Rational> constantValue() {
        if (terms.isEmpty()) {
            return Optional.of(Rational.ZERO);
        }
        Key constantKey = new Key(0, neutral(domain), Oscillation.NONE, Rational.ZERO, false, 0);
        return terms.size() == 1 && terms.containsKey(constantKey)
                ? Optional.of(terms.get(constantKey)) : Optional.empty();
    }

    /** This as slope·v + intercept (times π or not), if it has that form. */
    Optional<Linear> asLinear() {
        Rational slope = Rational.ZERO;
        Rational intercept = Rational.ZERO;
        int piPower = -1;
        for (Map.Entry<Key, Rational> e : terms.entrySet()) {
            Key k = e.getKey();
            boolean plain = k.oscillation() == Oscillation.NONE && k.exponential().equals(neutral(domain));
            if (!plain || k.power() > 1 || k.piPower() > 1 || (piPower >= 0 && piPower != k.piPower())) {
                return Optional.empty();
            }
            piPower = k.piPower();
            if (k.power() == 1) {
                slope = e.getValue();
            } else {
                intercept = e.getValue();
            }
        }
        return Optional.of(new Linear(slope, intercept, piPower == 1));
    }

    Forcing add(Forcing other) {
        Map<Key, Rational> sum = new LinkedHashMap<>(terms);
        other.terms.forEach((k, c) -> put(sum, k, c));
        return new Forcing(domain, sum);
    }

    Forcing scale(Rational factor) {
        Map<Key, Rational> scaled = new LinkedHashMap<>();
        terms.forEach((k, c) -> put(scaled, k, c.multiply(factor)));
        return new Forcing(domain, scaled);
    }

    Forcing negate() {
        return scale(Rational.MINUS_ONE);
    }

    /** True when a product would multiply a rational frequency with a multiple of π. */
    boolean mixesFrequencyKinds(Forcing other) {
        return terms.keySet().stream().anyMatch(a -> other.terms.keySet().stream()
                .anyMatch(b -> a.oscillation() != Oscillation.NONE && b.oscillation() != Oscillation.NONE
                        && a.timesPi() != b.timesPi()));
    }

    /** The expanded product; the caller has checked {@link #mixesFrequencyKinds}. */
    Forcing multiply(Forcing other) {
        Map<Key, Rational> product = new LinkedHashMap<>();
        terms.forEach((a, ca) -> other.terms.forEach((b, cb) -> multiplyInto(product, a, b, ca.multiply(cb))));
        return new Forcing(domain, product);
    }

    /** The highest power of the variable in any term (0 for none). */
    int degree() {
        return terms.keySet().stream().mapToInt(Key::power).max().orElse(0);
    }

    /** The number of distinct terms. */
    int size() {
        return terms.size();
    }

    /** Every exact number this holds: coefficients, exponential bases or rates, frequencies. */
    java.util.stream.Stream<Rational> numbers() {
        return terms.entrySet().stream().flatMap(e -> java.util.stream.Stream.of(e.getValue(), e.getKey().exponential(),
                e.getKey().frequency()));
    }

    /** The terms in a fixed order. */
    List<ForcingTerm> toTerms() {
        return terms.entrySet().stream().sorted(Map.Entry.comparingByKey(ORDER))
                .map(e -> new ForcingTerm(e.getValue(), e.getKey().power(), e.getKey().exponential(),
                        e.getKey().oscillation(), e.getKey().frequency(), e.getKey().timesPi()))
                .toList();
    }

    private void multiplyInto(Map<Key, Rational> product, Key a, Key b, Rational coefficient) {
        Rational exponential = domain == Domain.DIFFERENCE
                ? a.exponential().multiply(b.exponential()) : a.exponential().add(b.exponential());
        int power = a.power() + b.power();
        int piPower = a.piPower() + b.piPower();
        if (a.oscillation() == Oscillation.NONE || b.oscillation() == Oscillation.NONE) {
            Key trig = a.oscillation() == Oscillation.NONE ? b : a;
            put(product, new Key(power, exponential, trig.oscillation(), trig.frequency(), trig.timesPi(), piPower),
                    coefficient);
            return;
        }
        Rational half = coefficient.multiply(Rational.of(1, 2));
        Rational sum = a.frequency().add(b.frequency());
        Rational difference = a.frequency().subtract(b.frequency());
        boolean aSin = a.oscillation() == Oscillation.SIN;
        boolean bSin = b.oscillation() == Oscillation.SIN;
        // cos·cos = (cos(a-b) + cos(a+b))/2, sin·sin = (cos(a-b) - cos(a+b))/2,
        // sin·cos = (sin(a+b) + sin(a-b))/2, cos·sin = (sin(a+b) - sin(a-b))/2
        Oscillation kind = aSin == bSin ? Oscillation.COS : Oscillation.SIN;
        Rational sumSign = aSin && bSin ? half.negate() : half;
        Rational differenceSign = !aSin && bSin ? half.negate() : half;
        put(product, new Key(power, exponential, kind, sum, a.timesPi(), piPower), sumSign);
        put(product, new Key(power, exponential, kind, difference, a.timesPi(), piPower), differenceSign);
    }

    /** Adds c·key to the map after bringing the key to canonical form (ω &ge; 0, cos 0 = 1, sin 0 = 0). */
    private static void put(Map<Key, Rational> map, Key key, Rational coefficient) {
        Key k = key;
        Rational c = coefficient;
        if (k.oscillation() != Oscillation.NONE && k.frequency().isZero()) {
            if (k.oscillation() == Oscillation.SIN) {
                return;
            }
            k = new Key(k.power(), k.exponential(), Oscillation.NONE, Rational.ZERO, false, k.piPower());
        } else if (k.frequency().signum() < 0) {
            c = k.oscillation() == Oscillation.SIN ? c.negate() : c;
            k = new Key(k.power(), k.exponential(), k.oscillation(), k.frequency().negate(), k.timesPi(), k.piPower());
        }
        Rational total = map.getOrDefault(k, Rational.ZERO).add(c);
        if (total.isZero()) {
            map.remove(k);
        } else {
            map.put(k, total);
        }
    }
}
