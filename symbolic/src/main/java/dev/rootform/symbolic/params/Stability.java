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
 * then the Schur–Cohn recursion (p of degree d, lead L, constant c: L² − c² &gt; 0 and the same for
 * (L·p − c·p*)/z, p* the reversed polynomial; each reduced polynomial divided by the gcd of its
 * coefficients, which divides its leading coefficient and so is nonzero where that is positive).
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
        List<Constraint> raw = domain == Domain.DIFFERENTIAL ? hurwitz(a) : schurCohn(a);
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
        return domain == Domain.DIFFERENTIAL ? "Routh–Hurwitz" : "Schur–Cohn / Jury";
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

    private static List<Constraint> schurCohn(List<ParamPolynomial> a) {
        int n = a.size() - 1;
        List<String> names = a.get(0).names();
        ParamPolynomial lead = a.get(n);
        ParamPolynomial atOne = ParamPolynomial.constant(names, Rational.ZERO);
        ParamPolynomial atMinusOne = atOne;
        for (int j = 0; j <= n; j++) {
            atOne = atOne.add(a.get(j));
            atMinusOne = atMinusOne.add(j % 2 == 0 ? a.get(j) : a.get(j).negate());
        }
        List<Constraint> conditions = new ArrayList<>();
        conditions.add(new Constraint(lead.multiply(atOne), Relation.POSITIVE));
        conditions.add(new Constraint((n % 2 == 0 ? lead : lead.negate()).multiply(atMinusOne), Relation.POSITIVE));
        List<ParamPolynomial> p = new ArrayList<>(a);
        while (p.size() > 1) {
            Deadline.checkCurrent();
            int d = p.size() - 1;
            ParamPolynomial l = p.get(d);
            ParamPolynomial c = p.get(0);
            conditions.add(new Constraint(l.multiply(l).subtract(c.multiply(c)), Relation.POSITIVE));
            List<ParamPolynomial> next = new ArrayList<>();
            for (int j = 1; j <= d; j++) {
                next.add(l.multiply(p.get(j)).subtract(c.multiply(p.get(d - j))));
            }
            ParamPolynomial content = ParamPolynomial.constant(names, Rational.ZERO);
            for (ParamPolynomial q : next) {
                content = JasMultivariate.gcd(content, q);
            }
            if (content.isZero()) {
                break;
            }
            List<ParamPolynomial> reduced = new ArrayList<>();
            for (ParamPolynomial q : next) {
                reduced.add(JasMultivariate.divide(q, content));
            }
            p = reduced;
        }
        return conditions;
    }
}
