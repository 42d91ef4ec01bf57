package dev.rootform.symbolic.sinusoid;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Exact particular solutions of a recurrence Σ a_k·x[n + shift + k] = f(n) for the forcing terms
 * q·n^p·r^n·cos(ωn) and q·n^p·r^n·sin(ωn) with ω a nonzero rational (not a rational multiple of
 * π), by undetermined coefficients (common practice) in the basis n^j·r^n·cos(ωn),
 * n^j·r^n·sin(ωn), j ≤ m = the highest p, with constants in Q(c)[s] ({@link TrigNumber}).
 *
 * <p>Each frequency has its own field Q(cos ω)[sin ω]; the sum over frequencies is a formal sum.
 *
 * <p>Shifting uses cos(ω(n + d)) = cos(ωn)·cos(dω) − sin(ωn)·sin(dω) and
 * sin(ω(n + d)) = sin(ωn)·cos(dω) + cos(ωn)·sin(dω), with cos(dω) = T_d(c) and
 * sin(dω) = s·U_{d−1}(c) (Chebyshev polynomials of the first and second kind; handbook identities).
 *
 * <p>No resonance can occur: the trial form would fail only if r·e^{±iω} were a root of the
 * characteristic polynomial, which has rational coefficients; then e^{iω} would be algebraic, but
 * for a nonzero rational ω it is transcendental (Lindemann–Weierstrass). So the linear system for the
 * constants is always regular over the field Q(c)[s]/(s² + c² − 1).
 *
 * @since 0.1
 */
public final class SinusoidSolver {
    private SinusoidSolver() {
    }

    /** True for a term this class solves: cos or sin of a nonzero rational frequency (not times π). */
    public static boolean handles(ForcingTerm t) {
        return t.oscillation() != ForcingTerm.Oscillation.NONE && !t.frequencyTimesPi() && !t.frequency().isZero();
    }

    /** True for a recurrence with at least one forcing term this class solves. */
    public static boolean appliesTo(LinearEquation eq) {
        return eq.domain() == Domain.DIFFERENCE && eq.forcing().stream().anyMatch(SinusoidSolver::handles);
    }

    /**
     * One particular solution per (base, |frequency|) among the forcing terms that {@link #handles};
     * their sum solves the equation for those terms (other terms are left to the caller). The constants
     * of frequency ω lie in Q(cos ω)[sin ω].
     *
     * @throws IllegalArgumentException for a differential equation
     */
    public static List<SinusoidalParticular> particular(LinearEquation eq) {
        if (eq.domain() != Domain.DIFFERENCE) {
            throw new IllegalArgumentException("sampled sinusoids belong to recurrences");
        }
        Map<List<Rational>, List<ForcingTerm>> groups = new LinkedHashMap<>();
        for (ForcingTerm t : eq.forcing()) {
            if (handles(t)) {
                groups.computeIfAbsent(List.of(t.exponential(), t.frequency().abs()), k -> new ArrayList<>()).add(t);
            }
        }
        List<SinusoidalParticular> result = new ArrayList<>();
        groups.forEach((key, terms) -> result.add(solve(eq, key.get(0), key.get(1), terms)));
        return result;
    }

    /**
     * True when L applied to {@code p} equals its group's forcing terms exactly in Q(c)[s]: the
     * residual of every basis function n^i·r^n·cos(ωn), n^i·r^n·sin(ωn) is zero.
     */
    public static boolean verifies(LinearEquation eq, SinusoidalParticular p) {
        List<ForcingTerm> terms = eq.forcing().stream()
                .filter(t -> handles(t) && t.exponential().equals(p.base()) && t.frequency().abs().equals(p.frequency())).toList();
        int size = 2 * (p.degree() + 1);
        List<TrigNumber> unknowns = new ArrayList<>(p.cosine());
        unknowns.addAll(p.sine());
        TrigNumber[][] a = system(eq, p.base(), p.degree());
        TrigNumber[] f = forcing(terms, p.degree());
        for (int row = 0; row < size; row++) {
            TrigNumber sum = TrigNumber.ZERO;
            for (int col = 0; col < size; col++) {
                sum = sum.add(a[row][col].multiply(unknowns.get(col)));
            }
            if (!sum.equals(f[row])) {
                return false;
            }
        }
        return true;
    }

    private static SinusoidalParticular solve(LinearEquation eq, Rational base, Rational frequency, List<ForcingTerm> terms) {
        int m = terms.stream().mapToInt(ForcingTerm::power).max().orElseThrow();
        TrigNumber[] x = eliminate(system(eq, base, m), forcing(terms, m));
        return new SinusoidalParticular(frequency, base, List.of(x).subList(0, m + 1), List.of(x).subList(m + 1, 2 * m + 2));
    }

    /** The right-hand side: rows cos_0..cos_m, then sin_0..sin_m (sin(−ωn) = −sin(ωn)). */
    private static TrigNumber[] forcing(List<ForcingTerm> terms, int m) {
        TrigNumber[] f = new TrigNumber[2 * (m + 1)];
        Arrays.fill(f, TrigNumber.ZERO);
        for (ForcingTerm t : terms) {
            boolean cosine = t.oscillation() == ForcingTerm.Oscillation.COS;
            int row = (cosine ? 0 : m + 1) + t.power();
            Rational q = cosine ? t.coefficient() : t.coefficient().multiply(Rational.of(t.frequency().signum()));
            f[row] = f[row].add(TrigNumber.of(q));
        }
        return f;
    }

    /**
     * The matrix of L on the basis: column j (or m + 1 + j) holds L applied to n^j·r^n·cos(ωn) (or
     * sin), as coefficients of n^i·r^n·cos(ωn) in rows i and of n^i·r^n·sin(ωn) in rows m + 1 + i.
     */
    private static TrigNumber[][] system(LinearEquation eq, Rational base, int m) {
        int size = 2 * (m + 1);
        TrigNumber[][] a = new TrigNumber[size][size];
        for (TrigNumber[] row : a) {
            Arrays.fill(row, TrigNumber.ZERO);
        }
        for (int k = 0; k < eq.coefficients().size(); k++) {
            int d = eq.shift() + k;
            TrigNumber cosD = TrigNumber.cosineOfMultiple(d);
            TrigNumber sinD = TrigNumber.sineOfMultiple(d);
            Rational scale = eq.coefficients().get(k).multiply(base.pow(d));
            for (int j = 0; j <= m; j++) {
                RationalPolynomial shifted = RationalPolynomial.monomial(Rational.ONE, j).shift(Rational.of(d)); // (n + d)^j
                for (int i = 0; i <= j; i++) {
                    Deadline.checkCurrent();
                    TrigNumber w = TrigNumber.of(scale.multiply(shifted.coefficient(i)));
                    a[i][j] = a[i][j].add(w.multiply(cosD));
                    a[m + 1 + i][j] = a[m + 1 + i][j].subtract(w.multiply(sinD));
                    a[m + 1 + i][m + 1 + j] = a[m + 1 + i][m + 1 + j].add(w.multiply(cosD));
                    a[i][m + 1 + j] = a[i][m + 1 + j].add(w.multiply(sinD));
                }
            }
        }
        return a;
    }

    /** Gauss–Jordan elimination over the field Q(c)[s]/(s² + c² − 1). */
    private static TrigNumber[] eliminate(TrigNumber[][] a, TrigNumber[] b) {
        int size = b.length;
        for (int col = 0; col < size; col++) {
            int pivot = col;
            while (a[pivot][col].isZero()) {
                pivot++; // a pivot exists: the system is regular (see the class comment)
            }
            exchange(a, pivot, col);
            exchange(b, pivot, col);
            for (int row = 0; row < size; row++) {
                if (row == col || a[row][col].isZero()) {
                    continue;
                }
                Deadline.checkCurrent();
                TrigNumber factor = a[row][col].divide(a[col][col]);
                for (int k = col; k < size; k++) {
                    a[row][k] = a[row][k].subtract(factor.multiply(a[col][k]));
                }
                b[row] = b[row].subtract(factor.multiply(b[col]));
            }
        }
        TrigNumber[] x = new TrigNumber[size];
        for (int i = 0; i < size; i++) {
            x[i] = b[i].divide(a[i][i]);
        }
        return x;
    }

    private static void exchange(Object[] array, int i, int j) {
        Object held = array[i];
        array[i] = array[j];
        array[j] = held;
    }
}
