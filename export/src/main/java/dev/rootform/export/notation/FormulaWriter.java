package dev.rootform.export.notation;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.Angle;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.closedform.Coefficient;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.closedform.Term;
import dev.rootform.symbolic.model.Domain;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The one walk of a {@link ClosedForm} that every formula notation shares. It only arranges what
 * the tree holds: signs are pulled to the front, coefficients 1 and the factors e^(0·v), 1^n and
 * v^0 are left out, exact zero coefficients drop their part, and groups get parentheses where the
 * meaning needs them. The {@link Notation} spells the atoms.
 *
 * @since 0.1
 */
public final class FormulaWriter {
    /** The base of the exponential, spelled the same in every notation. */
    private static final String EULER = "e";
    private static final Coefficient ONE = new Coefficient.Exact(Surd.of(Rational.ONE));

    /** A summand written without its sign. */
    private record Signed(boolean negative, String body) {
        Signed flipped() {
            return new Signed(!negative, body);
        }
    }

    private final Notation n;
    private final ClosedForm form;
    private final boolean marked;
    /** The variable v as written: {@code t}, {@code n} or {@code (t - 3/2)}. */
    private final String v;
    /** v without its parentheses, for a function argument: {@code t - 3/2}. */
    private final String bare;

    public FormulaWriter(Notation notation, ClosedForm form) {
        this(notation, form, false);
    }

    /**
     * @param marked put {@link LineBreaker#MARK} before every + and − joiner of a sum, where a
     *     {@link LineBreaker} may break the line
     */
    FormulaWriter(Notation notation, ClosedForm form, boolean marked) {
        this.n = notation;
        this.form = form;
        this.marked = marked;
        Rational origin = form.origin();
        if (form.domain() == Domain.DIFFERENTIAL && !origin.isZero()) {
            bare = sum(List.of(new Signed(false, n.name(form.variable())), new Signed(origin.signum() > 0, number(origin.abs()))));
            v = n.parens(bare);
        } else {
            bare = n.name(form.variable());
            v = bare;
        }
    }

    /** The whole right-hand side; {@code 0} for no terms. */
    public String formula() {
        List<Signed> pieces = new ArrayList<>();
        for (Term t : form.terms()) {
            piece(t).ifPresent(pieces::add);
        }
        return sum(pieces);
    }

    /** One term alone, with its sign; {@code 0} if its coefficients are zero. */
    String term(Term t) {
        return sum(piece(t).stream().toList());
    }

    /** A coefficient alone, e.g. {@code -1/2·√5} or {@code C1}. */
    String coefficient(Coefficient c) {
        return sum(product(c, List.of()).stream().toList());
    }

    /** A rational number with its sign: {@code -3/2}. */
    public String signed(Rational q) {
        return sum(List.of(new Signed(q.signum() < 0, number(q.abs()))));
    }

    /** q·x written as a multiple: {@code 3π/4}, {@code -π/2}, {@code 2t}. */
    public String multiple(Rational q, String x) {
        return scaled(q, x);
    }

    /** A polynomial in descending powers of {@code variable}. */
    public String polynomial(RationalPolynomial p, String variable) {
        List<Signed> pieces = new ArrayList<>();
        for (int i = p.degree(); i >= 0; i--) {
            product(new Coefficient.Exact(Surd.of(p.coefficient(i))), List.of(power(variable, i))).ifPresent(pieces::add);
        }
        return sum(pieces);
    }

    private Optional<Signed> piece(Term t) {
        if (t instanceof Term.Exponential e) {
            return product(e.coefficient(), List.of(power(v, e.power()), growth(e.rate())));
        }
        if (t instanceof Term.Oscillating o) {
            String angle = angle(o.angle());
            return combination(List.of(o.cosine(), o.sine()),
                    List.of(n.function("cos", angle), n.function("sin", angle)),
                    List.of(power(v, o.power()), oscillationGrowth(o.growth())), false);
        }
        if (t instanceof Term.ConjugateSum r) {
            List<String> bases = new ArrayList<>();
            for (int j = 0; j < r.coefficients().size(); j++) {
                bases.add(power(n.lambda(), j));
            }
            String root = form.domain() == Domain.DIFFERENTIAL
                    ? n.power(n.name(EULER), n.implicit(n.lambda(), v))
                    : n.power(n.lambda(), v);
            return combination(r.coefficients(), bases, List.of(power(v, r.power()), root), true)
                    .map(s -> new Signed(s.negative(), n.conjugateSum(polynomial(r.factor(), n.lambda()), s.body())));
        }
        throw new AssertionError(t);
    }

    /**
     * Σ coefficients[i]·bases[i] times the outer factors. A single nonzero part is one product; two or
     * more are grouped in parentheses with the sign of the first part pulled out. The basis or group
     * goes before the outer factors when {@code basisFirst}, after them otherwise.
     */
    private Optional<Signed> combination(List<Coefficient> coefficients, List<String> bases, List<String> outer,
            boolean basisFirst) {
        List<Signed> parts = new ArrayList<>();
        int single = -1;
        for (int i = 0; i < coefficients.size(); i++) {
            Optional<Signed> part = product(coefficients.get(i), List.of(bases.get(i)));
            if (part.isPresent()) {
                parts.add(part.get());
                single = i;
            }
        }
        if (parts.size() <= 1) {
            return single < 0 ? Optional.empty()
                    : product(coefficients.get(single), arrange(bases.get(single), outer, basisFirst));
        }
        boolean negative = parts.get(0).negative();
        if (negative) {
            parts.replaceAll(Signed::flipped);
        }
        String group = (marked ? LineBreaker.MARK : "") + sum(parts);
        boolean bare = !negative && outer.stream().allMatch(String::isEmpty);
        return product(ONE, arrange(bare ? group : n.parens(group), outer, basisFirst))
                .map(s -> new Signed(negative, s.body()));
    }

    private static List<String> arrange(String basis, List<String> outer, boolean basisFirst) {
        List<String> all = new ArrayList<>(outer);
        all.add(basisFirst ? 0 : all.size(), basis);
        return all;
    }

    /** c·f1·f2·…, with empty factors skipped; empty for an exact zero. */
    private Optional<Signed> product(Coefficient c, List<String> factors) {
        if (c.isZero()) {
            return Optional.empty();
        }
        List<String> fs = new ArrayList<>();
        factors.stream().filter(f -> !f.isEmpty()).forEach(fs::add);
        boolean negative = false;
        if (c instanceof Coefficient.Free free) {
            fs.add(0, n.constant(free.name()));
        } else if (c instanceof Coefficient.Exact exact) {
            Surd s = exact.value();
            negative = leadsNegative(s);
            Surd m = negative ? s.negate() : s;
            if (!(m.isRational() && m.rational().isOne()) || fs.isEmpty()) {
                String written = surd(m);
                fs.add(0, fs.isEmpty() || m.isRational() ? written : twoParts(m) ? n.parens(written) : n.clarify(written));
            }
        } else if (c instanceof Coefficient.Trig trig) {
            List<Signed> parts = trig.parts().stream().map(p -> trig(p, trig.radicand())).toList();
            Signed written = parts.size() == 1 ? parts.get(0) : new Signed(false, sum(parts));
            negative = written.negative();
            fs.add(0, fs.isEmpty() ? written.body() : n.parens(written.body()));
        }
        return Optional.of(new Signed(negative, fs.stream().reduce(n::times).orElseThrow()));
    }

    /**
     * One part a + b·√r of a coefficient, a and b in Q(cos ω)[sin ω], over the common denominator D(cos ω):
     * (N0 + N1·sin ω + (N2 + N3·sin ω)·√r)/D, every N_k a polynomial in cos ω written term by term;
     * a sign in front of a lone numerator term is pulled out.
     */
    private Signed trig(Coefficient.Trig.Part t, BigInteger radicand) {
        String omega = number(t.frequency());
        String cos = n.function("cos", omega);
        String sin = n.function("sin", omega);
        String root = n.sqrt(n.number(radicand.toString()));
        List<RationalFunction> parts = List.of(t.rational().rational(), t.rational().sine(), t.radical().rational(),
                t.radical().sine());
        List<List<String>> extra = List.of(List.of(), List.of(sin), List.of(root), List.of(sin, root));
        RationalPolynomial d = RationalPolynomial.ONE;
        for (RationalFunction f : parts) {
            d = d.multiply(f.denominator()).divide(d.gcd(f.denominator()));
        }
        List<RationalPolynomial> tops = new ArrayList<>();
        for (RationalFunction f : parts) {
            tops.add(f.numerator().multiply(d.divide(f.denominator())));
        }
        // integer coefficients without a common factor: (N·L/g)/(D·L/g)
        List<RationalPolynomial> all = new ArrayList<>(tops);
        all.add(d);
        BigInteger lcm = BigInteger.ONE;
        BigInteger gcd = BigInteger.ZERO;
        for (RationalPolynomial p : all) {
            for (Rational q : p.coefficients()) {
                lcm = lcm.divide(lcm.gcd(q.denominator())).multiply(q.denominator());
            }
        }
        for (RationalPolynomial p : all) {
            for (Rational q : p.coefficients()) {
                gcd = gcd.gcd(q.multiply(Rational.of(lcm)).numerator());
            }
        }
        Rational scale = Rational.of(lcm, gcd.signum() == 0 ? BigInteger.ONE : gcd).multiply(Rational.of(d.leadingCoefficient().signum()));
        List<Signed> pieces = new ArrayList<>();
        for (int k = 0; k < parts.size(); k++) {
            RationalPolynomial top = tops.get(k).multiply(scale);
            for (int i = top.degree(); i >= 0; i--) {
                List<String> fs = new ArrayList<>();
                fs.add(power(cos, i));
                fs.addAll(extra.get(k));
                product(new Coefficient.Exact(Surd.of(top.coefficient(i))), fs).ifPresent(pieces::add);
            }
        }
        boolean negative = pieces.size() == 1 && pieces.get(0).negative();
        if (negative) {
            pieces.replaceAll(Signed::flipped);
        }
        String top = sum(pieces);
        RationalPolynomial bottom = d.multiply(scale);
        if (bottom.degree() == 0 && bottom.coefficient(0).isOne()) {
            return new Signed(negative, top);
        }
        long terms = bottom.coefficients().stream().filter(q -> !q.isZero()).count();
        boolean single = terms == 1 && (bottom.degree() == 0 || bottom.leadingCoefficient().isOne());
        String under = polynomial(bottom, cos);
        return new Signed(negative, n.fraction(pieces.size() > 1 ? n.clarify(top) : top, single ? under : n.clarify(under)));
    }

    /** e^(rate·v) for differential equations, rate^v for difference equations; empty when trivial. */
    private String growth(Surd rate) {
        if (form.domain() == Domain.DIFFERENTIAL) {
            return rate.isZero() ? "" : n.power(n.name(EULER), scaled(rate, v));
        }
        if (rate.isRational() && rate.rational().isOne()) {
            return "";
        }
        boolean bare = rate.isRational() && rate.rational().isInteger() && rate.signum() > 0;
        return n.power(bare ? surd(rate) : n.parens(surd(rate)), v);
    }

    /** Like {@link #growth}, but a modulus √r is written r^(v/2). */
    private String oscillationGrowth(Surd growth) {
        boolean root = form.domain() == Domain.DIFFERENCE && !growth.isRational() && growth.rational().isZero()
                && growth.coefficient().isOne();
        return root ? n.power(n.number(growth.radicand().toString()), scaled(Rational.of(1, 2), v)) : growth(growth);
    }

    /** angle·v as the argument of cos and sin, without doubled parentheses: {@code cos(t - 2)}. */
    private String angle(Angle a) {
        String argument = scaledAngle(a);
        return argument.equals(v) ? bare : argument;
    }

    private String scaledAngle(Angle a) {
        if (a instanceof Angle.PiMultiple p) {
            return scaled(p.multiple(), n.implicit(n.pi(), v));
        }
        if (a instanceof Angle.Value value) {
            return scaled(value.value(), v);
        }
        if (a instanceof Angle.ArcCos arc) {
            return n.times(v, n.function("arccos", surd(arc.cosine())));
        }
        throw new AssertionError(a);
    }

    /** s·x: {@code 2t}, {@code -t}, {@code 3t/2}, {@code √5·t}, {@code (1 + √5)·t}. */
    private String scaled(Surd s, String x) {
        if (!s.isRational()) {
            return n.times(twoParts(s) ? n.parens(surd(s)) : surd(s), x);
        }
        return scaled(s.rational(), x);
    }

    private String scaled(Rational q, String x) {
        Rational a = q.abs();
        String top = a.numerator().equals(BigInteger.ONE) ? x : n.implicit(n.number(a.numerator().toString()), x);
        String body = a.isInteger() ? top : n.fraction(top, n.number(a.denominator().toString()));
        return q.signum() < 0 ? n.negate(body) : body;
    }

    private String power(String base, int exponent) {
        return exponent == 0 ? "" : exponent == 1 ? base : n.power(base, n.number(Integer.toString(exponent)));
    }

    /** a + b·√r with its own signs. */
    private String surd(Surd s) {
        List<Signed> parts = new ArrayList<>();
        if (!s.rational().isZero() || s.isRational()) {
            parts.add(new Signed(s.rational().signum() < 0, number(s.rational().abs())));
        }
        if (!s.isRational()) {
            Rational b = s.coefficient().abs();
            String root = n.sqrt(n.number(s.radicand().toString()));
            parts.add(new Signed(s.coefficient().signum() < 0, b.isOne() ? root : n.times(number(b), root)));
        }
        return sum(parts);
    }

    private static boolean twoParts(Surd s) {
        return !s.isRational() && !s.rational().isZero();
    }

    private static boolean leadsNegative(Surd s) {
        return s.rational().isZero() ? s.coefficient().signum() < 0 : s.rational().signum() < 0;
    }

    private String number(Rational nonNegative) {
        return nonNegative.isInteger() ? n.number(nonNegative.toString())
                : n.fraction(n.number(nonNegative.numerator().toString()), n.number(nonNegative.denominator().toString()));
    }

    private String sum(List<Signed> pieces) {
        if (pieces.isEmpty()) {
            return n.number("0");
        }
        Signed first = pieces.get(0);
        StringBuilder sb = new StringBuilder(first.negative() ? n.negate(first.body()) : first.body());
        for (Signed p : pieces.subList(1, pieces.size())) {
            sb.append(marked ? LineBreaker.MARK : "").append(p.negative() ? n.minus() : n.plus()).append(p.body());
        }
        return sb.toString();
    }
}
