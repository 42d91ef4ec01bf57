package dev.rootform.numeric.analysis;

import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.closedform.Surd;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.ExactSolution;
import dev.rootform.symbolic.solve.RadicalSolution;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.function.IntFunction;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.OverflowException;

/**
 * A fitted differential-equation solution with exact constants, evaluated numerically: an
 * {@link ExactSolution}, or a {@link RadicalSolution} y = a + √r·b (constants in Q(√r), e.g. from
 * conditions at π/4). Its derivatives at the origin are exact (rational, or a + b√r); values
 * elsewhere come from its {@link ModeSum} at a working precision raised until two agree.
 */
final class FittedFunction {
    private final LinearEquation equation;
    private final Rational origin;
    private final IntFunction<Surd> atOrigin;
    private final IntFunction<ModeSum> sums;

    private FittedFunction(LinearEquation equation, Rational origin, IntFunction<Surd> atOrigin, IntFunction<ModeSum> sums) {
        this.equation = equation;
        this.origin = origin;
        this.atOrigin = atOrigin;
        this.sums = sums;
    }

    static FittedFunction of(ExactSolution s, RootCache cache) {
        return new FittedFunction(s.equation(), s.origin(), d -> Surd.of(s.derivativeAtOrigin(d)),
                working -> ModeSum.of(s, cache, working));
    }

    static FittedFunction of(RadicalSolution r, RootCache cache) {
        ExactSolution a = r.rational();
        ExactSolution b = r.radical();
        Rational radicand = Rational.of(r.radicand());
        return new FittedFunction(a.equation(), a.origin(), d -> Surd.of(a.derivativeAtOrigin(d), b.derivativeAtOrigin(d), radicand),
                working -> ModeSum.of(r, cache, working));
    }

    /**
     * y(t) to {@code wanted} significant digits; exact at the origin.
     *
     * @throws InputException when a term e^(λ·(t - t0)) lies beyond the exponent range of
     *     arbitrary-precision numbers (|λ·(t - t0)| of about 10^18 and more: y' = 10^20·y at t = 1)
     */
    PointValue value(Rational t, int wanted) {
        if (t.equals(origin)) {
            Surd v = atOrigin.apply(0);
            return new PointValue(t, v.toBigDecimal(new MathContext(wanted)), v.isRational() ? Optional.of(v.rational()) : Optional.empty(),
                    v.isRational() ? Optional.empty() : Optional.of(v));
        }
        try {
            Apfloat[] settled = WorkingPrecision.settle(wanted, working -> sums.apply(working).valueAndLargest(t),
                    (low, high, working) -> WorkingPrecision.agree(low, high, working, wanted),
                    (working, high) -> working + WorkingPrecision.GUARD_DIGITS
                            + (int) Math.ceil(ApfloatMath.log(high[1].add(Apfloat.ONE)).doubleValue() / Math.log(10)),
                    "value at t = " + t);
            return new PointValue(t, Decimals.toBigDecimal(settled[0], wanted), Optional.empty());
        } catch (OverflowException e) {
            throw new InputException("value at t = " + t + ": a term of the solution there exceeds the exponent range of "
                    + "arbitrary-precision numbers (e^(λ·t) with |λ·t| beyond about 10^18)", "", -1);
        }
    }

    /**
     * y(t) for the cancellation estimate: in double precision where the estimated rounding error is
     * below {@code relative}·max(1, |y|) ({@link DoubleModes}), else to {@link Analyzer#SAMPLE_DIGITS}
     * digits in apfloat, confirmed by two working precisions.
     */
    BigDecimal sample(Rational t, double relative) {
        OptionalDouble quick = doubles().accurate(t.doubleValue(), relative);
        return quick.isPresent() ? new BigDecimal(quick.getAsDouble()) : value(t, Analyzer.SAMPLE_DIGITS).value();
    }

    private DoubleModes doubles() {
        return sums.apply(Analyzer.SAMPLE_DIGITS + WorkingPrecision.GUARD_DIGITS).doubles();
    }

    /**
     * The integrator cross-check from the exact derivatives at the origin, on the problem's time
     * scales. The closed form is evaluated in double precision where its estimated rounding error is
     * below {@link IntegratorCheck#CLOSED_FORM_ERROR} relative ({@link DoubleModes}), else to 17
     * digits in apfloat, confirmed by two working precisions.
     */
    Check integratorCheck(List<RootApproximation> roots) {
        int k = equation.order();
        List<Rational> initial = new ArrayList<>(k);
        for (int d = 0; d < k; d++) {
            Surd v = atOrigin.apply(d);
            initial.add(v.isRational() ? v.rational() : Rational.of(v.toBigDecimal(new MathContext(Analyzer.STATE_DIGITS))));
        }
        DoubleModes doubles = doubles();
        IntegratorCheck.Solved closed = new IntegratorCheck.Solved() {
            @Override
            public double value(double t) {
                return doubles.accurate(t, IntegratorCheck.CLOSED_FORM_ERROR).orElseGet(() ->
                        FittedFunction.this.value(Rational.of(new BigDecimal(t)), Analyzer.SAMPLE_DIGITS).value().doubleValue());
            }

            @Override
            public List<Rational> state(Rational t) {
                ModeSum sum = sums.apply(Analyzer.STATE_DIGITS + WorkingPrecision.GUARD_DIGITS);
                List<Rational> state = new ArrayList<>(k);
                for (int d = 0; d < k; d++) {
                    state.add(Rational.of(Decimals.toBigDecimal(sum.derivative(d, t), Analyzer.STATE_DIGITS)));
                }
                return state;
            }
        };
        return IntegratorCheck.compare(equation, origin, initial, TimeScales.of(equation, roots), List.of(), closed, "t0");
    }
}
