package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.backend.JasMultivariate;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.List;

/**
 * Stability conditions on the parameters for a characteristic polynomial with coefficients in
 * Q(params), any order.
 *
 * <p>Differential: the Routh–Hurwitz criterion (A. Hurwitz, "Über die Bedingungen, unter welchen
 * eine Gleichung nur Wurzeln mit negativen reellen Theilen besitzt", Math. Ann. 46, 1895): with
 * a_N &gt; 0 all leading principal minors Δ_k of the Hurwitz matrix H_ij = a_{N−2j+i} are positive;
 * for a leading coefficient of either sign Δ_k(χ/a_N) = Δ_k/a_N^k, so the conditions are
 * a_N^(k mod 2)·Δ_k &gt; 0. Minors by Bareiss's fraction-free elimination over Q[params].
 *
 * <p>Difference: Jury's necessary conditions a_N·χ(1) &gt; 0 and (−1)^N·a_N·χ(−1) &gt; 0 first,
 * then the Hurwitz conditions of the image of χ under the bilinear map z = (1 + s)/(1 − s) (the
 * Schur–Cohn recursion gives the same set but its polynomials double in degree at each step: measured
 * 52 s at order 4 with four parameters against milliseconds this way).
 *
 * <p>Each condition is factored; factors already known positive (from the assumptions or earlier
 * conditions) and squares of factors known nonzero are dropped, and conditions left with nothing
 * are redundant.
 */
final class Stability {
    private Stability() {
    }

    static StabilityConditions of(Domain domain, List<ParamFunction> coefficients, Assumptions assumptions) {
        List<ParamPolynomial> a = integral(coefficients);
        List<Constraint> raw = domain == Domain.DIFFERENTIAL ? hurwitz(a) : jury(a);
        Signs signs = new Signs(assumptions);
        List<Constraint> kept = new ArrayList<>();
        for (Constraint c : raw) {
            Deadline.checkCurrent();
            Signs.Outcome o = signs.impose(c);
            if (o instanceof Signs.Never) {
                return new StabilityConditions(criterion(domain), StabilityConditions.Verdict.NEVER, List.of());
            }
            if (o instanceof Signs.Open open) {
                kept.add(open.constraint());
            }
        }
        return new StabilityConditions(criterion(domain),
                kept.isEmpty() ? StabilityConditions.Verdict.ALWAYS : StabilityConditions.Verdict.WHEN, kept);
    }

    private static String criterion(Domain domain) {
        return domain == Domain.DIFFERENTIAL ? "Routh–Hurwitz" : "Jury, by Routh–Hurwitz after z = (1 + s)/(1 − s)";
    }

    /** The coefficients times the lcm of their denominators: polynomials with the same roots. */
    static List<ParamPolynomial> integral(List<ParamFunction> coefficients) {
        List<String> names = coefficients.get(0).names();
        ParamPolynomial lcm = ParamPolynomial.constant(names, Rational.ONE);
        for (ParamFunction c : coefficients) {
            ParamPolynomial d = c.denominator();
            lcm = JasMultivariate.divide(lcm.multiply(d), JasMultivariate.gcd(lcm, d));
        }
        List<ParamPolynomial> out = new ArrayList<>();
        for (ParamFunction c : coefficients) {
            out.add(JasMultivariate.divide(c.numerator().multiply(lcm), c.denominator()));
        }
        return out;
    }

    private static List<Constraint> hurwitz(List<ParamPolynomial> a) {
        int n = a.size() - 1;
        List<String> names = a.get(0).names();
        ParamPolynomial[][] h = new ParamPolynomial[n][n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < n; j++) {
                int index = n - 2 * (j + 1) + (i + 1);
                h[i][j] = index >= 0 && index <= n ? a.get(index) : ParamPolynomial.constant(names, Rational.ZERO);
            }
        }
        List<Constraint> conditions = new ArrayList<>();
        ParamPolynomial lead = a.get(n);
        ParamPolynomial previous = ParamPolynomial.constant(names, Rational.ONE);
        for (int k = 0; k < n; k++) {
            ParamPolynomial minor = h[k][k];
            conditions.add(new Constraint(k % 2 == 0 ? lead.multiply(minor) : minor, Relation.POSITIVE));
            if (minor.isZero()) {
                return conditions;
            }
            for (int i = k + 1; i < n; i++) {
                Deadline.checkCurrent();
                for (int j = k + 1; j < n; j++) {
                    h[i][j] = JasMultivariate.divide(h[k][k].multiply(h[i][j]).subtract(h[i][k].multiply(h[k][j])), previous);
                }
            }
            previous = minor;
        }
        return conditions;
    }

    /**
     * Jury's necessary conditions a_N·p(1) &gt; 0 and (−1)^N·a_N·p(−1) &gt; 0, then the Hurwitz
     * conditions of q(s) = Σ a_j·(1 + s)^j·(1 − s)^(N−j), the image of p under z = (1 + s)/(1 − s),
     * which maps |z| &lt; 1 onto Re s &lt; 0 (so p has every root inside the unit circle exactly when q
     * is Hurwitz; q(0) = p(1) and q's leading coefficient is (−1)^N·p(−1)).
     */
    private static List<Constraint> jury(List<ParamPolynomial> a) {
        int n = a.size() - 1;
        List<String> names = a.get(0).names();
        ParamPolynomial lead = a.get(n);
        ParamPolynomial zero = ParamPolynomial.constant(names, Rational.ZERO);
        List<ParamPolynomial> q = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            q.add(zero);
        }
        for (int j = 0; j <= n; j++) {
            // (1 + s)^j (1 − s)^(n−j), coefficients by convolution of binomials
            long[] plus = binomials(j, 1);
            long[] minus = binomials(n - j, -1);
            for (int u = 0; u <= j; u++) {
                for (int w = 0; w <= n - j; w++) {
                    q.set(u + w, q.get(u + w).add(a.get(j).scale(Rational.of(plus[u] * minus[w]))));
                }
            }
        }
        List<Constraint> conditions = new ArrayList<>();
        conditions.add(new Constraint(lead.multiply(q.get(0)), Relation.POSITIVE));
        conditions.add(new Constraint(lead.multiply(q.get(n)), Relation.POSITIVE));
        conditions.addAll(hurwitz(q));
        return conditions;
    }

    /** The coefficients of (1 + sign·s)^k. */
    private static long[] binomials(int k, int sign) {
        long[] c = new long[k + 1];
        c[0] = 1;
        for (int i = 1; i <= k; i++) {
            c[i] = c[i - 1] * (k - i + 1) / i;
        }
        for (int i = 1; i <= k; i += 2) {
            c[i] *= sign;
        }
        return c;
    }
}
