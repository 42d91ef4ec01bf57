package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.claim.Claim;
import dev.rootform.symbolic.claim.ConditionFinding;
import dev.rootform.symbolic.claim.Decision;
import dev.rootform.symbolic.claim.EquationFinding;
import dev.rootform.symbolic.claim.Expr;
import dev.rootform.symbolic.claim.Expressions;
import dev.rootform.symbolic.claim.Mismatch;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.work.Deadline;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;

/**
 * The numeric check of a claim, for what the exact check cannot decide and for the largest
 * difference of a function claim on a grid: the claim is evaluated by Taylor jets ({@link
 * JetEvaluator}) at a working precision {@link #GUARD_DIGITS} above the requested digits, and
 * compared to the requested digits. A numeric verdict is evidence at the sample points, not a
 * proof, and says so.
 *
 * @since 0.3
 */
public final class NumericClaimCheck {
    /** Digits carried beyond the requested ones. */
    public static final int GUARD_DIGITS = 20;
    /** Grid of a function claim: t0 + i·STEP for i = 0..GRID_POINTS − 1. */
    static final int GRID_POINTS = 21;
    static final Rational STEP = Rational.of(1, 2);
    /** Indices of a sequence claim sampled beyond the first: at least this many. */
    static final int SEQUENCE_SAMPLES = 24;
    /** Significant digits of a value shown beside a comparison. */
    static final int SHOWN_DIGITS = 16;
    /** Beyond this magnitude a decimal is written with an exponent. */
    private static final int PLAIN_LIMIT = 6;

    private final Solution solution;
    private final Claim claim;
    private final LinearEquation eq;
    private final int digits;
    private final long precision;
    private final Apfloat tolerance;
    /** The solution's formula with numerically fixed constants put in; empty for a general solution. */
    private final Optional<Expr> solutionForm;
    /** Values (order 0) of the claim, the forcing and the values claimed one by one; root sums' roots cached. */
    private final JetEvaluator values;

    private NumericClaimCheck(Solution solution, Map<String, BigDecimal> constants, Claim claim, int digits) {
        this.solution = solution;
        this.solutionForm = resolved(solution, constants);
        this.claim = claim;
        this.eq = solution.problem().equation();
        this.digits = digits;
        this.precision = digits + GUARD_DIGITS;
        this.tolerance = new Apfloat("1e-" + Math.max(1, digits - 3), precision);
        this.values = new JetEvaluator(precision, 0);
    }

    /** The sample points: indices of a sequence from its first index, a grid of a function from its condition point. */
    public static List<Rational> samplePoints(Solution solution) {
        List<Rational> points = new ArrayList<>();
        if (solution.problem().conditions().isEmpty()) {
            return points;
        }
        if (solution.problem().equation().domain() == Domain.DIFFERENCE) {
            long first = solution.closedForm().origin().toBigInteger().longValueExact();
            for (int i = 0; i < sequenceSamples(solution); i++) {
                points.add(Rational.of(first + i));
            }
            return points;
        }
        Rational t0 = gridStart(solution);
        for (int i = 0; i < GRID_POINTS; i++) {
            points.add(t0.add(STEP.multiply(i)));
        }
        return points;
    }

    /**
     * Checks the claim numerically.
     *
     * @param constants the values of the solution's numerically fixed constants (boundary values,
     *     trial forms), by name; empty when its constants are exact
     * @param digits significant digits of the comparisons
     * @throws UnsupportedOperationException if the claim uses arccos, arcsin or arctan of the variable
     */
    public static NumericFindings check(Solution solution, Map<String, BigDecimal> constants, Claim claim, int digits) {
        return new NumericClaimCheck(solution, constants, claim, digits).run();
    }

    /**
     * Only the largest difference between a function claim and the solution on the grid of
     * {@link #samplePoints(Solution)}, for a claim decided exactly.
     */
    public static Optional<Mismatch> largestDifference(Solution solution, Map<String, BigDecimal> constants, Claim claim,
            int digits) {
        // a figure to show: its values to SHOWN_DIGITS, the difference to 3 digits
        return new NumericClaimCheck(solution, constants, claim, Math.min(digits, SHOWN_DIGITS)).largestDifference(samplePoints(solution));
    }

    /** The solution's formula as an expression, its free constants replaced by their values. */
    private static Optional<Expr> resolved(Solution solution, Map<String, BigDecimal> constants) {
        if (solution.problem().conditions().isEmpty()) {
            return Optional.empty();
        }
        Map<String, Rational> values = new HashMap<>();
        constants.forEach((name, value) -> values.put(name, Rational.of(value)));
        return Optional.of(Expressions.of(solution.closedForm().withConstantValues(values)));
    }

    private NumericFindings run() {
        boolean sequence = eq.domain() == Domain.DIFFERENCE;
        List<Rational> points = samplePoints(solution);
        if (points.isEmpty()) {
            points = defaultPoints();
        }
        EquationFinding equation = sequence ? sequenceEquation(points) : functionEquation(points);
        List<ConditionFinding> conditions = new ArrayList<>();
        for (Condition c : solution.problem().conditions()) {
            conditions.add(condition(c));
        }
        Optional<Mismatch> mismatch = solutionForm.isEmpty() ? Optional.empty()
                : sequence ? firstMismatch(points) : largestDifference(points);

        Decision verdict = equation.decision();
        for (ConditionFinding c : conditions) {
            verdict = verdict.and(c.decision());
        }
        if (sequence && mismatch.isPresent()) {
            verdict = Decision.FAILS;
        }
        return new NumericFindings(verdict, digits, equation, conditions, mismatch, range(points));
    }

    // ---- sample points ----

    private static int sequenceSamples(Solution solution) {
        return Math.max(SEQUENCE_SAMPLES, 2 * solution.problem().equation().order() + 8);
    }

    private static Rational gridStart(Solution solution) {
        List<Condition> conditions = solution.problem().conditions();
        return conditions.isEmpty() || conditions.get(0).atTimesPi() ? Rational.ZERO : conditions.get(0).at();
    }

    private List<Rational> defaultPoints() {
        List<Rational> points = new ArrayList<>();
        int n = eq.domain() == Domain.DIFFERENCE ? sequenceSamples(solution) : GRID_POINTS;
        for (int i = 0; i < n; i++) {
            points.add(eq.domain() == Domain.DIFFERENCE ? Rational.of(i) : STEP.multiply(i));
        }
        return points;
    }

    private String range(List<Rational> points) {
        String v = eq.variable();
        return v + " = " + points.get(0) + (eq.domain() == Domain.DIFFERENCE ? ".." : ", " + points.get(1) + ", …, ")
                + points.get(points.size() - 1);
    }

    // ---- the claim's values ----

    /** The claimed value at index n, or null when the claim does not cover n. */
    private Apcomplex sequenceValue(long n) {
        for (Claim.ExplicitValue v : claim.values()) {
            if (v.index() == n) {
                return values.at(v.value(), apfloat(Rational.ZERO)).value();
            }
        }
        long from = claim.from().orElse(solution.closedForm().origin().toBigInteger().longValueExact());
        return n >= from ? values.at(claim.formula(), apfloat(Rational.of(n))).value() : null;
    }

    private EquationFinding sequenceEquation(List<Rational> points) {
        int k = eq.order();
        Apfloat worst = Apfloat.ZERO;
        boolean holds = true;
        int checked = 0;
        for (Rational point : points.subList(0, points.size() - k)) {
            Deadline.checkCurrent();
            long m = point.toBigInteger().longValueExact();
            Apcomplex sum = values.at(Expressions.forcing(eq), apfloat(Rational.of(m - eq.shift()))).value().negate();
            Apfloat scale = ApcomplexMath.abs(sum);
            boolean complete = true;
            for (int j = 0; j <= k && complete; j++) {
                Apcomplex v = sequenceValue(m + j);
                complete = v != null;
                if (complete) {
                    Apcomplex term = v.multiply(apfloat(eq.coefficients().get(j)));
                    sum = sum.add(term);
                    scale = max(scale, ApcomplexMath.abs(term));
                }
            }
            if (complete) {
                checked++;
                Apfloat size = ApcomplexMath.abs(sum);
                worst = max(worst, size);
                holds &= small(size, scale);
            }
        }
        return new EquationFinding(checked == 0 ? Decision.UNDECIDED : Decision.of(holds), false, Optional.empty(),
                "numeric, " + digits + " digits: largest |residual| " + decimal(worst, 3) + " at " + checked + " indices");
    }

    private EquationFinding functionEquation(List<Rational> points) {
        int k = eq.order();
        JetEvaluator claimJets = new JetEvaluator(precision, k);
        Apfloat worst = Apfloat.ZERO;
        boolean holds = true;
        for (Rational t : points) {
            Deadline.checkCurrent();
            Jet y = claimJets.at(claim.formula(), apfloat(t));
            Apcomplex sum = values.at(Expressions.forcing(eq), apfloat(t)).value().negate();
            Apfloat scale = ApcomplexMath.abs(sum);
            for (int j = 0; j <= k; j++) {
                Apcomplex term = y.derivative(j).multiply(apfloat(eq.coefficients().get(j)));
                sum = sum.add(term);
                scale = max(scale, ApcomplexMath.abs(term));
            }
            Apfloat size = ApcomplexMath.abs(sum);
            worst = max(worst, size);
            holds &= small(size, scale);
        }
        return new EquationFinding(Decision.of(holds), false, Optional.empty(), "numeric, " + digits
                + " digits: largest |residual| " + decimal(worst, 3) + " at " + points.size() + " points " + range(points));
    }

    private ConditionFinding condition(Condition c) {
        Apcomplex claimed;
        if (eq.domain() == Domain.DIFFERENCE) {
            claimed = sequenceValue(c.at().toBigInteger().longValueExact());
            if (claimed == null) {
                return new ConditionFinding(c, "not claimed", Decision.UNDECIDED, false);
            }
        } else {
            Apfloat t = c.atTimesPi() ? apfloat(c.at()).multiply(ApfloatMath.pi(precision)) : apfloat(c.at());
            claimed = new JetEvaluator(precision, c.derivative()).at(claim.formula(), t).derivative(c.derivative());
        }
        Apcomplex required = apfloat(c.value());
        Apfloat scale = max(ApcomplexMath.abs(required), ApcomplexMath.abs(claimed));
        boolean holds = small(ApcomplexMath.abs(claimed.subtract(required)), scale);
        return new ConditionFinding(c, "≈ " + decimal(claimed), Decision.of(holds), false);
    }

    // ---- comparison with the solution ----

    /** x[n] of a fitted sequence, exactly (a rational, or a + b·√r). */
    private Surd exactValue(long n) {
        return solution.exact().map(s -> Surd.of(s.valueAt(n))).orElseGet(() -> solution.radical().orElseThrow().valueAt(n));
    }

    private Optional<Mismatch> firstMismatch(List<Rational> points) {
        for (Rational p : points) {
            Deadline.checkCurrent();
            long n = p.toBigInteger().longValueExact();
            Apcomplex claimed = sequenceValue(n);
            if (claimed == null) {
                continue;
            }
            Apcomplex x;
            String required;
            if (solution.sinusoid().isPresent()) {
                x = new Apfloat(SinusoidValues.value(solution.sinusoid().get(), p, (int) precision, new RootCache()).value(), precision);
                required = "≈ " + decimal(x);
            } else {
                Surd exact = exactValue(n);
                x = new Apfloat(exact.toBigDecimal(new MathContext((int) precision)), precision);
                required = exact.toString();
            }
            Apfloat difference = ApcomplexMath.abs(claimed.subtract(x));
            if (!small(difference, max(ApcomplexMath.abs(claimed), ApcomplexMath.abs(x)))) {
                return Optional.of(new Mismatch(p.toString(), "≈ " + decimal(claimed), required, ""));
            }
        }
        return Optional.empty();
    }

    private Optional<Mismatch> largestDifference(List<Rational> points) {
        Mismatch largest = null;
        Apfloat worst = new Apfloat(-1, precision);
        for (Rational t : points) {
            Deadline.checkCurrent();
            Apcomplex claimed = values.at(claim.formula(), apfloat(t)).value();
            Apcomplex x = values.at(solutionForm.orElseThrow(), apfloat(t)).value();
            Apfloat difference = ApcomplexMath.abs(claimed.subtract(x));
            if (difference.compareTo(worst) > 0) {
                worst = difference;
                largest = new Mismatch(point(t), "≈ " + decimal(claimed), "≈ " + decimal(x), decimal(difference, 3));
            }
        }
        return Optional.ofNullable(largest);
    }

    // ---- numbers ----

    private boolean small(Apfloat size, Apfloat scale) {
        return size.compareTo(tolerance.multiply(max(scale, new Apfloat(1, precision)))) <= 0;
    }

    private static Apfloat max(Apfloat a, Apfloat b) {
        return a.compareTo(b) >= 0 ? a : b;
    }

    private Apfloat apfloat(Rational q) {
        return new Apfloat(q.toBigDecimal(new MathContext((int) precision)), precision);
    }

    /** A real value to the requested digits, at most {@link #SHOWN_DIGITS} (the imaginary part of a real claim is rounding noise). */
    private String decimal(Apcomplex z) {
        return decimal(z.real(), Math.min(digits, SHOWN_DIGITS));
    }

    private static String decimal(Apfloat x, int shown) {
        if (x.signum() == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(x.toString(true)).round(new MathContext(shown)).stripTrailingZeros();
        int magnitude = d.precision() - d.scale() - 1;
        return Math.abs(magnitude) <= PLAIN_LIMIT ? d.toPlainString() : d.toString().replace("E", "e");
    }

    private static String point(Rational t) {
        try {
            return new BigDecimal(t.numerator()).divide(new BigDecimal(t.denominator())).toPlainString();
        } catch (ArithmeticException endless) {
            return t.toString();
        }
    }
}
