package dev.rootform.numeric.analysis;

import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.solve.Check;
import java.math.BigDecimal;
import java.util.List;
import java.util.Objects;

/**
 * A solution computed numerically because the exact path could not finish in its share of the
 * time limit ({@link NumericFallback}): y = Σ over the modes of u^p·e^{σu}(a_p·cos ωu + b_p·sin ωu)
 * for a differential equation (u = t − origin, root λ = σ + iω) and Σ n^p·ρ^n(a_p·cos θn + b_p·sin θn)
 * for a recurrence (λ = ρe^{iθ}); a real root has no sine part. Roots are certified enclosures,
 * constants and values are rounded to {@code digits}; nothing here is exact, and the checks are
 * numerical (iteration of the recurrence, or integration of the equation).
 *
 * @param problem the problem as read
 * @param reason why the exact path did not finish, one line
 * @param origin the origin t0 of u (differential), 0 for recurrences
 * @param modes one per real root and per conjugate pair (the root with ω &gt; 0 stands for both)
 * @param values the solution's values at the requested points, to {@code digits}
 * @param checks the numerical checks
 * @param digits significant digits of roots, constants and values
 * @since 0.2
 */
public record NumericSolution(Problem problem, String reason, BigDecimal origin, List<Mode> modes, List<PointValue> values,
        List<Check> checks, int digits) {
    public NumericSolution {
        Objects.requireNonNull(problem, "problem");
        Objects.requireNonNull(reason, "reason");
        Objects.requireNonNull(origin, "origin");
        modes = List.copyOf(modes);
        values = List.copyOf(values);
        checks = List.copyOf(checks);
    }

    /** True when no numerical check failed (and at least one ran). */
    public boolean verified() {
        return checks.stream().noneMatch(Check::failed) && checks.stream().anyMatch(Check::passed);
    }

    /**
     * One real root or conjugate pair with its constants.
     *
     * @param re real part of the root, to {@code digits}
     * @param im imaginary part (&gt; 0 for a pair, 0 for a real root)
     * @param radius the root lies within this distance of re + i·im (certified)
     * @param multiplicity its multiplicity
     * @param cosine a_p for p = 0 .. multiplicity − 1 (the coefficient of the real part)
     * @param sine b_p for a pair, empty for a real root
     */
    public record Mode(BigDecimal re, BigDecimal im, BigDecimal radius, int multiplicity, List<BigDecimal> cosine,
            List<BigDecimal> sine) {
        public Mode {
            Objects.requireNonNull(re, "re");
            Objects.requireNonNull(im, "im");
            Objects.requireNonNull(radius, "radius");
            cosine = List.copyOf(cosine);
            sine = List.copyOf(sine);
        }
    }
}
