package dev.rootform.api;

import dev.rootform.export.Report;
import dev.rootform.export.document.SystemReport;
import dev.rootform.export.document.SystemReport.Eigenvalue;
import dev.rootform.export.document.SystemReport.SignalReport;
import dev.rootform.export.document.SystemReport.ValueRow;
import dev.rootform.numeric.analysis.Analyzer;
import dev.rootform.numeric.analysis.PointValue;
import dev.rootform.numeric.diagnostics.Stability;
import dev.rootform.symbolic.algebra.Factor;
import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.algebra.RationalPolynomial;
import dev.rootform.symbolic.backend.JasFactorizer;
import dev.rootform.symbolic.matrix.MatrixText;
import dev.rootform.symbolic.matrix.RationalMatrix;
import dev.rootform.symbolic.matrix.Resolvent;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.Problem;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.solve.Check;
import dev.rootform.symbolic.solve.Solution;
import dev.rootform.symbolic.solve.Solver;
import dev.rootform.symbolic.statespace.Input;
import dev.rootform.symbolic.statespace.InputReader;
import dev.rootform.symbolic.statespace.KalmanMatrices;
import dev.rootform.symbolic.statespace.Signal;
import dev.rootform.symbolic.statespace.StateEquations;
import dev.rootform.symbolic.statespace.StateModel;
import dev.rootform.symbolic.statespace.TransferMatrix;
import dev.rootform.symbolic.statespace.TransitionMatrix;
import java.math.MathContext;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;

/**
 * One state-space analysis: read the matrices, compute χ, μ and the adjugate exactly, solve the
 * fundamental solutions through the exact {@link Solver} ({@link Solver#solveBasis}: substitution,
 * the values being proven with the assembled matrix; φ_0 also analysed for its roots and stability)
 * and every state and output of the response through {@link Rootform#solve},
 * assemble e^(At) or A^n, the transfer matrix and the Kalman ranks, cross-check the response
 * against the matrices themselves ({@link ResponseCheck}), and classify the outcome.
 */
final class SystemJob {
    /** Digits of the scalar solves' values at least, so that the cross-check compares more than the shown digits. */
    private static final int CHECK_DIGITS = 20;

    private SystemJob() {
    }

    static SystemResult run(SystemRequest request) {
        Duration limit = request.options().timeLimit();
        return TimeLimit.within(limit, () -> analyse(request), new SystemResult.NoAnswer(new Result.OutOfTime(limit)));
    }

    private static SystemResult analyse(SystemRequest request) {
        try {
            return classify(report(request));
        } catch (InputException e) {
            return new SystemResult.NoAnswer(SolveJob.refused(e));
        } catch (Unsolved e) {
            return new SystemResult.NoAnswer(e.result);
        }
    }

    private static SystemReport report(SystemRequest request) {
        Options options = request.options();
        Domain domain = request.continuous() ? Domain.DIFFERENTIAL : Domain.DIFFERENCE;
        RationalMatrix a = MatrixText.matrix("A", request.a());
        if (!a.isSquare()) {
            throw new InputException("A must be square, got " + a.shape(), request.a(), 0);
        }
        StateModel model = StateModel.of(domain, a, request.b().map(t -> MatrixText.matrix("B", t)).orElse(null),
                request.c().map(t -> MatrixText.matrix("C", t)).orElse(null),
                request.d().map(t -> MatrixText.matrix("D", t)).orElse(null));
        List<Rational> x0 = request.x0().map(t -> MatrixText.vector("x0", t))
                .orElse(Collections.nCopies(model.states(), Rational.ZERO));
        if (x0.size() != model.states()) {
            throw new InputException("x0 has " + x0.size() + " entries, A has " + model.states() + " states",
                    request.x0().orElse(""), 0);
        }
        Input input = request.input().map(t -> InputReader.read(domain, t)).orElse(new Input.None());
        if (!(input instanceof Input.None) && model.inputs() == 0) {
            throw new InputException("an input needs B: the model has no input matrix", request.input().orElse(""), 0);
        }
        List<Rational> points = Points.parse(options.points());
        Options scalar = options.toBuilder().points(List.of()).digits(Math.max(options.digits(), CHECK_DIGITS)).code(false)
                .build();

        Resolvent resolvent = Resolvent.of(a);
        RationalPolynomial minimal = resolvent.minimalPolynomial();
        List<Factor> factors = JasFactorizer.factor(resolvent.characteristic());
        StateEquations equations = new StateEquations(model, minimal);
        // every φ_k needs only the exact solver's substitution check (it lies in the kernel of μ):
        // the values are proven with the whole matrix by X(0) = I, X^(k+1)(0) = A·X^(k)(0)
        // (TransitionMatrix); φ_0 is also analysed (roots, stability, integrator check)
        List<Problem> problems = equations.fundamentals();
        Solution phi0 = Solver.solveBasis(problems.get(0));
        Report first = new Report(phi0, new Analyzer(scalar.digits()).analyze(phi0, List.of()), scalar.digits(), scalar.numeric());
        List<Solution> solutions = new ArrayList<>(List.of(phi0));
        problems.subList(1, problems.size()).forEach(p -> solutions.add(Solver.solveBasis(p)));
        TransitionMatrix transition = TransitionMatrix.of(a, minimal, solutions);
        List<Check> checks = new ArrayList<>();
        checks.add(fundamentalsVerified(first, solutions));
        checks.addAll(transition.checks());
        boolean adjugate = resolvent.adjugateIdentityHolds();
        checks.add(new Check("adjugate of sI − A", adjugate, adjugate
                ? "(sI − A)·adj(sI − A) = χ(s)·I, coefficient by coefficient, exactly" : "(sI − A)·adj(sI − A) ≠ χ(s)·I"));

        List<SignalReport> states = new ArrayList<>();
        List<SignalReport> outputs = new ArrayList<>();
        List<ValueRow> values = new ArrayList<>();
        boolean respond = request.x0().isPresent() || !(input instanceof Input.None) || !points.isEmpty();
        if (respond) {
            ResponseCheck cross = new ResponseCheck(model, x0, input);
            List<Rational> all = new ArrayList<>(points);
            all.addAll(cross.points(minimal.degree()));
            Options withPoints = scalar.toBuilder().points(all.stream().map(Rational::toString).toList())
                    .code(options.code()).build();
            for (Signal s : equations.response(x0, input)) {
                SignalReport r = new SignalReport(s, solved(s.problem(), withPoints));
                (s.name().startsWith("x") ? states : outputs).add(r);
            }
            List<SignalReport> signals = new ArrayList<>(states);
            signals.addAll(outputs);
            checks.add(verifiedBySolver("state and output equations", signals.stream().map(SignalReport::report).toList()));
            checks.add(cross.check(states, outputs, points.size(), minimal.degree()));
            for (int p = 0; p < points.size(); p++) {
                values.add(new ValueRow(points.get(p), valuesAt(states, p, options.digits()), valuesAt(outputs, p, options.digits())));
            }
        }
        Stability stability = first.diagnostics().orElseThrow().stability();
        Optional<TransferMatrix> transfer = model.inputs() > 0 && model.outputs() > 0
                ? Optional.of(TransferMatrix.of(model, resolvent)) : Optional.empty();
        OptionalInt controllable = model.inputs() > 0 ? OptionalInt.of(KalmanMatrices.controllability(model).rank())
                : OptionalInt.empty();
        OptionalInt observable = model.outputs() > 0 ? OptionalInt.of(KalmanMatrices.observability(model).rank())
                : OptionalInt.empty();
        return new SystemReport(model, x0, input, resolvent.characteristic(), factors, minimal,
                eigenvalues(first, factors), stability, transition, transfer, controllable, observable, states, outputs,
                values, checks, options.digits());
    }

    /** Solves one scalar problem through the API; a refusal or time-out ends the analysis. */
    private static Report solved(Problem problem, Options options) {
        Result r = Rootform.solve(SolveRequest.of(problem).with(options));
        return r.answer().orElseThrow(() -> new Unsolved(r));
    }

    /**
     * The solver's checks of φ_0..φ_{d-1}: exact substitution, and for φ_0 the numeric checks of its
     * analysis; their values are part of the transition matrix's exact check.
     */
    private static Check fundamentalsVerified(Report first, List<Solution> solutions) {
        List<String> failed = new ArrayList<>();
        for (int k = 0; k < solutions.size(); k++) {
            if (!(k == 0 ? first.verified() : solutions.get(k).verified())) {
                failed.add("φ_" + k);
            }
        }
        return new Check("fundamental solutions φ_0..φ_" + (solutions.size() - 1) + " verified by the solver",
                failed.isEmpty(), failed.isEmpty() ? solutions.size() + " scalar problems, each by exact substitution (μ"
                        + " annihilates every component), φ_0 also by numerical integration (continuous); their initial"
                        + " values are proven with the whole matrix (X(0) = I and X' = AX, or X[n+1] = A·X[n], below)"
                        : "failed for " + String.join(", ", failed));
    }

    private static Check verifiedBySolver(String what, List<Report> reports) {
        List<String> failed = new ArrayList<>();
        for (Report r : reports) {
            if (!r.verified()) {
                failed.add(r.solution().problem().equation().function());
            }
        }
        return new Check(what + " verified by the solver", failed.isEmpty(), failed.isEmpty()
                ? reports.size() + " scalar problems, each with exact substitution, its conditions, an independent reference"
                        + " and (continuous) numerical integration"
                : "failed for " + String.join(", ", failed));
    }

    /** Each distinct eigenvalue: μ's roots in factor order, with χ's multiplicity beside μ's. */
    private static List<Eigenvalue> eigenvalues(Report report, List<Factor> characteristic) {
        List<Eigenvalue> out = new ArrayList<>();
        int index = 0;
        for (Factor f : report.solution().factors()) {
            int algebraic = characteristic.stream().filter(c -> c.polynomial().equals(f.polynomial()))
                    .mapToInt(Factor::multiplicity).findFirst().orElseThrow();
            for (int j = 0; j < f.degree(); j++, index++) {
                out.add(new Eigenvalue(report.solution().roots().get(index), report.roots().get(index), algebraic,
                        f.multiplicity()));
            }
        }
        return out;
    }

    /** The signals' values at point p; before the pulse acts (n = 0) the stated value replaces the formula's. */
    private static List<PointValue> valuesAt(List<SignalReport> signals, int p, int digits) {
        List<PointValue> out = new ArrayList<>();
        for (SignalReport s : signals) {
            PointValue v = s.report().values().get(p);
            if (s.signal().start() == 1 && v.at().isZero()) {
                Rational before = s.signal().before();
                v = new PointValue(v.at(), before.toBigDecimal(new MathContext(digits)), Optional.of(before));
            }
            out.add(new PointValue(v.at(), v.value().round(new MathContext(digits)), v.exact(), v.exactSurd()));
        }
        return out;
    }

    private static SystemResult classify(SystemReport report) {
        if (report.verified()) {
            return new SystemResult.Analysed(report);
        }
        return new SystemResult.CheckFailed(report, report.checks().stream().filter(c -> !c.passed()).map(Check::name).toList());
    }

    /** A scalar solve that gave no answer (refused or out of time). */
    private static final class Unsolved extends RuntimeException {
        private static final long serialVersionUID = 1L;
        private final transient Result result;

        Unsolved(Result result) {
            super(result.toString(), null, false, false);
            this.result = result;
        }
    }
}
