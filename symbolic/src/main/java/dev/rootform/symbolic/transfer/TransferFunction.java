package dev.rootform.symbolic.transfer;

import dev.rootform.symbolic.algebra.RationalFunction;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.model.Domain;
import java.util.List;
import java.util.Objects;

/**
 * A transfer function as the user named it: H(s) of a continuous-time system (Laplace variable
 * s, time t &ge; 0) or H(z) of a discrete-time one (z-transform variable z, index n &ge; 0), in
 * lowest terms, with the pole–zero pairs that reducing it cancelled.
 *
 * @param domain {@link Domain#DIFFERENTIAL} for s, {@link Domain#DIFFERENCE} for z
 * @param name the name of the part that is answered, e.g. {@code H}
 * @param variable {@code s} or {@code z}
 * @param value the function in lowest terms, in positive powers of the variable
 * @param cancelled the monic irreducible factors that the numerator and denominator of the
 *     written interconnection had in common, with multiplicities
 * @since 0.3
 */
public record TransferFunction(Domain domain, String name, String variable, RationalFunction value, List<Factor> cancelled) {
    public TransferFunction {
        Objects.requireNonNull(domain, "domain");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(variable, "variable");
        Objects.requireNonNull(value, "value");
        cancelled = List.copyOf(cancelled);
    }

    /** True when the function is in s (continuous time). */
    public boolean continuous() {
        return domain == Domain.DIFFERENTIAL;
    }

    /** {@code H(s)}. */
    public String signature() {
        return name + "(" + variable + ")";
    }
}
