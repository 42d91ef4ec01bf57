package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.function.Supplier;

/**
 * Looks for the usual mistakes of a hand derivation in a failing claim: each is undone on a copy of
 * the claim, and reported only when that copy then holds exactly. The claim's terms, for this, are
 * its additive pieces as written, products multiplied out ({@code (3 + 2)e^(-t)} has the pieces
 * 3e^(-t) and 2e^(-t)).
 */
final class SlipFinder {
    /** Beyond this many pieces the claim is taken as one piece. */
    private static final int MAX_PIECES = 48;

    private final ExactCheck check;
    private final Candidate claimed;
    private final LinearEquation eq;
    private final Domain domain;
    private final List<Slip> slips = new ArrayList<>();
    private final Set<Slip.Kind> found = EnumSet.noneOf(Slip.Kind.class);

    SlipFinder(ExactCheck check, Candidate claimed) {
        this.check = check;
        this.claimed = claimed;
        this.eq = check.equation();
        this.domain = eq.domain();
    }

    List<Slip> find() {
        List<Piece> pieces = pieces();
        if (domain == Domain.DIFFERENCE) {
            validityRange();
            indexOrigin();
        }
        for (Piece p : pieces) {
            missingFactor(p);
        }
        rootSign();
        cosSin(pieces);
        for (Piece p : pieces) {
            constantSign(p);
        }
        steadyPart();
        return slips;
    }

    /** One additive piece of the claim: its tree and its exact form. */
    private record Piece(Expr tree, ExpSum form) {
    }

    private void indexOrigin() {
        for (int k : new int[] {-1, 1}) {
            try {
                Candidate c = claimed.with(claimed.formula().shift(k));
                String v = eq.variable();
                report(Slip.Kind.INDEX_ORIGIN, c, () -> "the formula is off by one index: it gives " + eq.function() + "["
                        + v + (k < 0 ? " + 1" : " - 1") + "] where " + eq.function() + "[" + v + "] is due; with " + v
                        + (k < 0 ? " - 1" : " + 1") + " in place of " + v + " it holds");
            } catch (NotExact e) {
                return;
            }
        }
    }

    private void validityRange() {
        long first = check.firstIndex();
        long valid = check.solution().closedForm().validFrom();
        if (valid <= first || claimed.from() >= valid || !check.hasValues()) {
            return;
        }
        Map<Long, ExactValue> values = new HashMap<>(claimed.values());
        for (long n = first; n < valid; n++) {
            values.putIfAbsent(n, check.solutionValue(n));
        }
        int m = eq.characteristicPolynomial().zeroRootMultiplicity();
        report(Slip.Kind.VALIDITY_RANGE, new Candidate(claimed.formula(), valid, values), () -> "λ = 0 is a root of multiplicity "
                + m + ", so the formula holds only from " + eq.variable() + " = " + valid + " on; the first "
                + (m == 1 ? "value has to be given on its own" : m + " values have to be given on their own"));
    }

    private void missingFactor(Piece p) {
        try {
            ExpSum withFactor = p.form().multiply(ExpSum.variable(check.ring(), domain));
            Candidate c = claimed.with(claimed.formula().subtract(p.form()).add(withFactor));
            report(Slip.Kind.MISSING_FACTOR, c, () -> {
                Algebraic rate = mainRate(p.form());
                return "the term at " + rootText(rate) + " needs a factor " + eq.variable() + ": " + why(rate);
            });
        } catch (NotExact e) {
            // a piece with a root sum: no factor to add
        }
    }

    /** "λ = 2 is a root of multiplicity 2 …", "the forcing resonates with …", or both. */
    private String why(Algebraic rate) {
        int m = multiplicity(rate);
        boolean resonance = m > 0 && check.forcing().modes().keySet().stream()
                .anyMatch(mode -> mode.rate().equals(rate));
        String repeated = rootText(rate) + " is a root of multiplicity " + m + " of the characteristic polynomial";
        String resonant = "the forcing resonates with the characteristic root " + rootText(rate);
        return m >= 2 && resonance ? repeated + ", and the forcing resonates with it" : m >= 2 ? repeated : resonant;
    }

    /** The multiplicity of a rational or quadratic root in χ (0 if it is not a root). */
    private int multiplicity(Algebraic rate) {
        for (Factor f : check.solution().factors()) {
            Algebraic v = check.ring().zero();
            RationalPolynomial p = f.polynomial();
            for (int j = p.degree(); j >= 0; j--) {
                v = v.multiply(rate).add(check.ring().rational(p.coefficient(j)));
            }
            if (v.isZero()) {
                return f.multiplicity();
            }
        }
        return 0;
    }

    private void rootSign() {
        Set<Algebraic> seen = new LinkedHashSet<>();
        for (ExpSum.Mode m : claimed.formula().modes().keySet()) {
            Algebraic rate = m.rate();
            if (rate.equals(ExpSum.neutral(check.ring(), domain).rate()) || rate.isZero() || !seen.add(rate)) {
                continue;
            }
            seen.add(rate.conjugate());
            Algebraic conjugate = rate.conjugate();
            ExpSum flipped = claimed.formula().mapRates(r -> r.equals(rate) || r.equals(conjugate) ? flip(r) : r);
            report(Slip.Kind.ROOT_SIGN, claimed.with(flipped), () -> "the root " + rootText(flip(rate))
                    + " appears with the wrong sign, as " + rootText(rate));
        }
    }

    /** −β for a sequence; the sign of the growth, −conj(λ), for a function (cos stays cos). */
    private Algebraic flip(Algebraic rate) {
        return domain == Domain.DIFFERENCE ? rate.negate() : rate.conjugate().negate();
    }

    private void cosSin(List<Piece> pieces) {
        Expr whole = swapped(claimedTree());
        if (whole != null) {
            tryCosSin(check.evaluator().evaluate(whole), "cos and sin are exchanged; exchanged back, the claim holds");
        }
        for (Piece p : pieces) {
            Expr swapped = swapped(p.tree());
            if (swapped != null) {
                ExpSum corrected = claimed.formula().subtract(p.form()).add(check.evaluator().evaluate(swapped));
                tryCosSin(corrected, "cos and sin are exchanged in the term at " + rootText(mainRate(p.form()))
                        + "; exchanged back, the claim holds");
            }
        }
    }

    private void tryCosSin(ExpSum corrected, String explanation) {
        report(Slip.Kind.COS_SIN, claimed.with(corrected), () -> explanation);
    }

    private void constantSign(Piece p) {
        Candidate c = claimed.with(claimed.formula().subtract(p.form()).subtract(p.form()));
        report(Slip.Kind.CONSTANT_SIGN, c, () -> "the term at " + rootText(mainRate(p.form()))
                + " has the wrong sign; negated, the claim holds");
    }

    private void steadyPart() {
        ClosedForm solution = check.solution().closedForm();
        if (eq.isHomogeneous() || solution.particularTerms().isEmpty()) {
            return;
        }
        try {
            ExpSum particular = check.evaluator().evaluate(Expressions.of(solution.withTerms(solution.particularTerms())));
            report(Slip.Kind.STEADY_PART, claimed.with(claimed.formula().add(particular)), () ->
                    "the particular (steady) part that the forcing produces is missing: the claim solves only the homogeneous equation");
        } catch (IllegalArgumentException | NotExact e) {
            // a particular part with numerically fixed constants: not exact
        }
    }

    /** Adds the slip when the corrected candidate holds and the kind is not reported yet. */
    private void report(Slip.Kind kind, Candidate corrected, Supplier<String> explanation) {
        Deadline.checkCurrent();
        if (found.contains(kind) || !check.holds(corrected)) {
            return;
        }
        Optional<ClosedForm> form = check.statement(corrected);
        if (form.isPresent()) {
            found.add(kind);
            slips.add(new Slip(kind, explanation.get(), form.get()));
        }
    }

    // ---- pieces ----

    private Expr claimedTree() {
        return check.claim().formula();
    }

    private List<Piece> pieces() {
        List<Expr> trees = expand(claimedTree());
        if (trees.size() > MAX_PIECES) {
            trees = List.of(claimedTree());
        }
        List<Piece> pieces = new ArrayList<>();
        for (Expr t : trees) {
            try {
                pieces.add(new Piece(t, check.evaluator().evaluate(t)));
            } catch (NotExact e) {
                return List.of();
            }
        }
        return pieces;
    }

    /** The additive pieces of e, products of sums multiplied out. */
    private static List<Expr> expand(Expr e) {
        if (e instanceof Expr.Negation n) {
            return expand(n.operand()).stream().map(x -> (Expr) new Expr.Negation(x, x.start())).toList();
        }
        if (e instanceof Expr.Binary b) {
            List<Expr> left = expand(b.left());
            switch (b.op()) {
                case ADD:
                    return concat(left, expand(b.right()));
                case SUBTRACT:
                    return concat(left, expand(new Expr.Negation(b.right(), b.right().start())));
                case MULTIPLY: {
                    List<Expr> right = expand(b.right());
                    if ((long) left.size() * right.size() > MAX_PIECES) {
                        return List.of(e);
                    }
                    List<Expr> products = new ArrayList<>();
                    for (Expr x : left) {
                        for (Expr y : right) {
                            products.add(new Expr.Binary(Expr.Binary.Op.MULTIPLY, x, y, x.start()));
                        }
                    }
                    return products;
                }
                case DIVIDE:
                    return left.stream().map(x -> (Expr) new Expr.Binary(Expr.Binary.Op.DIVIDE, x, b.right(), x.start())).toList();
                default:
                    return List.of(e);
            }
        }
        return List.of(e);
    }

    private static List<Expr> concat(List<Expr> a, List<Expr> b) {
        List<Expr> all = new ArrayList<>(a);
        all.addAll(b);
        return all;
    }

    /** The tree with cos and sin exchanged, or null when it has neither. */
    private static Expr swapped(Expr e) {
        if (e instanceof Expr.Call c) {
            Expr.Call.Function f = c.function() == Expr.Call.Function.COS ? Expr.Call.Function.SIN
                    : c.function() == Expr.Call.Function.SIN ? Expr.Call.Function.COS : null;
            Expr inner = swapped(c.argument());
            if (f == null) {
                return inner == null ? null : new Expr.Call(c.function(), inner, c.start());
            }
            return new Expr.Call(f, c.argument(), c.start());
        }
        if (e instanceof Expr.Negation n) {
            Expr inner = swapped(n.operand());
            return inner == null ? null : new Expr.Negation(inner, n.start());
        }
        if (e instanceof Expr.Binary b) {
            Expr left = swapped(b.left());
            Expr right = swapped(b.right());
            return left == null && right == null ? null
                    : new Expr.Binary(b.op(), left == null ? b.left() : left, right == null ? b.right() : right, b.start());
        }
        return null;
    }

    // ---- describing roots ----

    /** The rate of a piece's first mode that is not a plain polynomial. */
    private Algebraic mainRate(ExpSum piece) {
        Algebraic neutral = ExpSum.neutral(check.ring(), domain).rate();
        return piece.modes().keySet().stream().map(ExpSum.Mode::rate).filter(r -> !r.equals(neutral)).findFirst()
                .orElse(neutral);
    }

    /** "λ = 2" or "λ = -1 ± 2i". */
    private static String rootText(Algebraic rate) {
        if (rate.isReal()) {
            return "λ = " + ValueText.of(rate);
        }
        Algebraic im = rate.imaginaryPart();
        Algebraic size = im.toSurd().map(s -> s.signum() < 0 ? im.negate() : im).orElse(im);
        String re = rate.realPart().isZero() ? "" : ValueText.of(rate.realPart()) + " ";
        String imaginary = ValueText.of(size);
        String times = imaginary.equals("1") ? "" : imaginary.matches("\\d+") ? imaginary : imaginary.contains(" ") ? "(" + imaginary + ")·" : imaginary + "·";
        return "λ = " + re + "± " + times + "i";
    }

}
