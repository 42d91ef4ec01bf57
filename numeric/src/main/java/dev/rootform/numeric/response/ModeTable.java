package dev.rootform.numeric.response;

import dev.rootform.numeric.roots.Enclosure;
import dev.rootform.numeric.roots.RootFinder;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.solve.Component;
import dev.rootform.symbolic.solve.ExactSolution;
import java.util.ArrayList;
import java.util.List;

/**
 * A fitted solution as a table of modes w·v^p·e^{αv} (functions) or w·n^p·α^n (sequences) in
 * double precision, with certified root values: a fast evaluator to scan for sign changes, and
 * the envelope Σ |w|·v^p·|e^{αv}| of the modes other than the steady one, an upper bound on
 * |y − steady value| that {@link StepFigureFinder} uses to know when the response has settled.
 * Doubles only steer the search; every figure is refined and decided in high precision or exactly.
 */
final class ModeTable {
    /** Digits of the root values behind the doubles. */
    private static final int ROOT_DIGITS = 20;

    /** One mode; {@code steady} marks the step's own mode (α = 0 for functions, α = 1 for sequences). */
    record Mode(double wRe, double wIm, int power, double aRe, double aIm, boolean steady) {
    }

    private final boolean continuous;
    private final List<Mode> modes;

    private ModeTable(boolean continuous, List<Mode> modes) {
        this.continuous = continuous;
        this.modes = List.copyOf(modes);
    }

    static ModeTable of(ExactSolution s) {
        boolean continuous = s.domain() == Domain.DIFFERENTIAL;
        RationalPolynomial steady = continuous ? RationalPolynomial.X
                : RationalPolynomial.ofIntegers(-1, 1);
        List<Mode> modes = new ArrayList<>();
        for (Component c : s.components()) {
            RationalPolynomial f = c.factor().polynomial();
            for (Enclosure e : new RootFinder(ROOT_DIGITS).roots(f)) {
                double aRe = e.re().doubleValue();
                double aIm = e.im().doubleValue();
                for (int i = 0; i < c.coefficients().size(); i++) {
                    double[] w = at(c.coefficients().get(i), aRe, aIm);
                    modes.add(new Mode(w[0], w[1], i, aRe, aIm, f.equals(steady)));
                }
            }
        }
        return new ModeTable(continuous, modes);
    }

    boolean isContinuous() {
        return continuous;
    }

    List<Mode> modes() {
        return modes;
    }

    /** y(v) (or y[n] for v = n at or past the first index of the formula). */
    double value(double v) {
        double sum = 0;
        for (Mode m : modes) {
            sum += term(m, v, 0);
        }
        return sum;
    }

    /** y'(v) of a function. */
    double derivative(double v) {
        double sum = 0;
        for (Mode m : modes) {
            sum += term(m, v, 1);
        }
        return sum;
    }

    /** Σ over the non-steady modes of |w|·v^p·|growth(v)|, a bound on |y(v) − steady part|. */
    double envelope(double v) {
        double sum = 0;
        for (Mode m : modes) {
            if (!m.steady()) {
                double growth = continuous ? Math.exp(m.aRe() * v) : Math.pow(Math.hypot(m.aRe(), m.aIm()), v);
                sum += Math.hypot(m.wRe(), m.wIm()) * Math.pow(v, m.power()) * growth;
            }
        }
        return sum;
    }

    /** Re of w·D^d(v^p·e^{αv}) for d ≤ 1 (functions), or Re of w·n^p·α^n (sequences, d = 0). */
    private double term(Mode m, double v, int d) {
        double re;
        double im;
        if (continuous) {
            double mag = Math.exp(m.aRe() * v);
            re = mag * Math.cos(m.aIm() * v);
            im = mag * Math.sin(m.aIm() * v);
        } else {
            double r = Math.pow(Math.hypot(m.aRe(), m.aIm()), v);
            double theta = Math.atan2(m.aIm(), m.aRe()) * v;
            re = r * Math.cos(theta);
            im = r * Math.sin(theta);
        }
        double vp = Math.pow(v, m.power());
        double fRe = vp * re;
        double fIm = vp * im;
        if (d == 1) {
            // D(v^p e^{αv}) = (p v^(p-1) + α v^p) e^{αv}
            double lead = m.power() == 0 ? 0 : m.power() * Math.pow(v, m.power() - 1);
            double gRe = lead * re + (m.aRe() * fRe - m.aIm() * fIm);
            double gIm = lead * im + (m.aRe() * fIm + m.aIm() * fRe);
            fRe = gRe;
            fIm = gIm;
        }
        return m.wRe() * fRe - m.wIm() * fIm;
    }

    /** c(α) = Σ c_j α^j at α = aRe + i·aIm, as {re, im}. */
    private static double[] at(RationalPolynomial c, double aRe, double aIm) {
        double re = 0;
        double im = 0;
        for (int j = c.degree(); j >= 0; j--) {
            double r = re * aRe - im * aIm + c.coefficient(j).doubleValue();
            im = re * aIm + im * aRe;
            re = r;
        }
        return new double[] {re, im};
    }
}
