package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.closedform.ExactRoot;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.statespace.Input;
import dev.rootform.symbolic.statespace.Signal;
import dev.rootform.symbolic.statespace.StateModel;
import dev.rootform.symbolic.statespace.TransferMatrix;
import dev.rootform.symbolic.statespace.TransitionMatrix;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * Everything one state-space answer shows. Renderers only format it.
 *
 * @param model A, B, C, D and the time domain
 * @param x0 the initial state
 * @param input the input applied to every input channel
 * @param characteristic χ(λ) = det(λI − A)
 * @param factors χ's monic irreducible factors over Q with multiplicities
 * @param minimal the minimal polynomial μ of A
 * @param eigenvalues every distinct eigenvalue, factor by factor
 * @param stability internal (Lyapunov) stability of x' = Ax or x[n+1] = Ax[n], decided on μ's roots
 * @param transition e^(At) or A^n entry by entry, with its exact checks
 * @param transfer C(sI − A)^(-1)B + D, when the model has inputs and outputs
 * @param controllabilityRank rank of [B AB … A^(n−1)B], when the model has inputs
 * @param observabilityRank rank of [C; CA; …; CA^(n−1)], when the model has outputs
 * @param states x1..xn of the response, each with its solved scalar report (empty when no response
 *     was asked: no x0, no input, no points)
 * @param outputs y1..yp of the response likewise
 * @param values the response at the requested points
 * @param checks every system-level check, all run
 * @param digits significant digits of decimals
 * @since 0.3
 */
public record SystemReport(StateModel model, List<Rational> x0, Input input, RationalPolynomial characteristic,
        List<Factor> factors, RationalPolynomial minimal, List<Eigenvalue> eigenvalues, Stability stability,
        TransitionMatrix transition, Optional<TransferMatrix> transfer, OptionalInt controllabilityRank,
        OptionalInt observabilityRank, List<SignalReport> states, List<SignalReport> outputs, List<ValueRow> values,
        List<Check> checks, int digits) {
    public SystemReport {
        Objects.requireNonNull(model, "model");
        x0 = List.copyOf(x0);
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(characteristic, "characteristic");
        factors = List.copyOf(factors);
        Objects.requireNonNull(minimal, "minimal");
        eigenvalues = List.copyOf(eigenvalues);
        Objects.requireNonNull(stability, "stability");
        Objects.requireNonNull(transition, "transition");
        Objects.requireNonNull(transfer, "transfer");
        Objects.requireNonNull(controllabilityRank, "controllabilityRank");
        Objects.requireNonNull(observabilityRank, "observabilityRank");
        states = List.copyOf(states);
        outputs = List.copyOf(outputs);
        values = List.copyOf(values);
        checks = List.copyOf(checks);
    }

    /** True when every check ran and held. */
    public boolean verified() {
        return checks.stream().allMatch(Check::passed);
    }

    /** True when the model is asymptotically stable. */
    public boolean stable() {
        return stability.verdict() == Stability.Verdict.ASYMPTOTICALLY_STABLE;
    }

    /** The symbol of the transform variable: s or z. */
    public String transformVariable() {
        return model.continuous() ? "s" : "z";
    }

    /**
     * One distinct eigenvalue of A.
     *
     * @param root the exact root
     * @param approximation its decimal value
     * @param algebraic its multiplicity in χ
     * @param index its multiplicity in μ: the size of its largest Jordan block (1: semisimple)
     */
    public record Eigenvalue(ExactRoot root, RootApproximation approximation, int algebraic, int index) {
        public Eigenvalue {
            Objects.requireNonNull(root, "root");
            Objects.requireNonNull(approximation, "approximation");
        }
    }

    /**
     * One state or output of the response with the solver's report on its scalar problem.
     *
     * @param signal the scalar problem and how its closed form relates to the signal
     * @param report the solved, verified scalar problem
     */
    public record SignalReport(Signal signal, Report report) {
        public SignalReport {
            Objects.requireNonNull(signal, "signal");
            Objects.requireNonNull(report, "report");
        }
    }

    /**
     * The response at one point.
     *
     * @param at t or n
     * @param state x1..xn there
     * @param output y1..yp there
     */
    public record ValueRow(Rational at, List<PointValue> state, List<PointValue> output) {
        public ValueRow {
            Objects.requireNonNull(at, "at");
            state = List.copyOf(state);
            output = List.copyOf(output);
        }
    }
}
