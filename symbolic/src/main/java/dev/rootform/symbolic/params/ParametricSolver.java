package dev.rootform.symbolic.params;

import dev.rootform.symbolic.algebra.ParamFactor;
import dev.rootform.symbolic.algebra.ParamPolynomial;
import dev.rootform.symbolic.backend.JasMultivariate;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.Limits;
import dev.rootform.symbolic.work.Deadline;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Solves an equation with parameters exactly over Q(params) and splits the answer into cases.
 *
 * <p>The solution is fitted in the basis of ker μ ({@link ParamBasis}): deg A rows say L y − g
 * vanishes with its first deg A derivatives at 0 (or values from the first index), which proves
 * L y = g because L y − g lies in ker A; the other rows are the conditions. The system is solved
 * over Q(params); the irreducible factors of its determinant and of the denominators are the
 * parameter values where this formula fails (a forcing rate or frequency meeting a natural one,
 * roots meeting). Each such factor that is linear in some parameter gives its own case, solved
 * again with that parameter substituted (resonance: t·sin forms); the others are named in a note.
 * Each pair of roots of χ splits by the sign of its discriminant into real, double and complex;
 * the formula is the same in all three (see {@link ParamMode}). Cases that cannot hold under the
 * assumptions are dropped. Every case is checked exactly by {@link ParamVerifier}.
 *
 * @since 0.3
 */
public final class ParametricSolver {
    private static final int MAX_DEPTH = 2;
    private static final int MAX_CASES = 24;

    private ParametricSolver() {
    }

    /**
     * The cases of the solution and the stability conditions.
     *
     * @throws InputException for a problem out of scope (an irreducible factor of degree ≥ 3 over
     *     Q(params), too high an order, a number of conditions other than the order or none)
     */
    public static ParametricAnswer solve(ParametricProblem problem, Assumptions assumptions) {
        StabilityConditions stability = Stability.of(problem.domain(), problem.coefficients(), assumptions);
        List<ParametricCase> cases = new ArrayList<>();
        Set<String> notes = new LinkedHashSet<>();
        try {
            cases(problem, new Signs(assumptions), List.of(), "", 0, cases, notes);
        } catch (ModeFinder.HighDegree e) {
            return new ParametricAnswer(problem, assumptions, List.of(), stability, List.of(e.getMessage()));
        }
        return new ParametricAnswer(problem, assumptions, cases, stability, List.copyOf(notes));
    }

    /** Stability conditions alone (no solve): Routh–Hurwitz or Schur–Cohn / Jury. */
    public static StabilityConditions stability(ParametricProblem problem, Assumptions assumptions) {
        return Stability.of(problem.domain(), problem.coefficients(), assumptions);
    }

    private static void cases(ParametricProblem problem, Signs signs, List<Constraint> when, String substitution, int depth,
            List<ParametricCase> out, Set<String> notes) {
        Deadline.checkCurrent();
        int order = problem.order();
        boolean general = problem.conditions().isEmpty();
        if (!general && problem.conditions().size() != order) {
            throw new InputException("give " + order + " conditions (or none for the general solution): "
                    + problem.conditions().size() + " given", problem.source(), -1);
        }
        List<String> names = new ArrayList<>(problem.parameters());
        List<String> constants = new ArrayList<>();
        if (general) {
            for (int i = 1; i <= order; i++) {
                String c = "C" + i;
                while (names.contains(c)) {
                    c = c + "_";
                }
                constants.add(c);
                names.add(c);
            }
        }
        ModeFinder.Modes found;
        try {
            found = ModeFinder.of(problem, names);
        } catch (ModeFinder.HighDegree e) {
            if (depth == 0) {
                throw e;
            }
            notes.add("where " + join(when) + ": " + e.getMessage());
            return;
        }
        List<ParamMode> modes = found.modes();
        int size = modes.stream().mapToInt(m -> m.width() * m.multiplicity()).sum();
        if (size > Limits.MAX_PARAMETRIC_ORDER) {
            throw new InputException("order " + size + " with the forcing: at most " + Limits.MAX_PARAMETRIC_ORDER
                    + " with parameters", problem.source(), -1);
        }
        Signs local = signs.copy();
        List<Constraint> excluded = new ArrayList<>();
        Set<ParamPolynomial> structural = new LinkedHashSet<>();
        for (ParamPolynomial p : found.nonzero()) {
            for (ParamPolynomial f : irreducible(p.over(problem.parameters()))) {
                structural.add(f);
                if (!admit(local, new Constraint(f, Relation.NONZERO), excluded)) {
                    return;
                }
            }
        }
        Signs base = local.copy();
        ParamBasis basis = new ParamBasis(problem.domain(), modes);
        Optional<Fitted> fitted = fit(problem, basis, names, constants);
        if (fitted.isEmpty()) {
            throw new InputException("the conditions do not determine one solution for general values of the parameters",
                    problem.source(), -1);
        }
        Set<ParamPolynomial> special = new LinkedHashSet<>();
        for (ParamPolynomial p : fitted.get().singular()) {
            for (ParamPolynomial f : irreducible(p.over(problem.parameters()))) {
                if (structural.contains(f)) {
                    continue;
                }
                Signs.Outcome o = local.simplify(new Constraint(f, Relation.NONZERO));
                if (o instanceof Signs.Never) {
                    notes.add("where " + join(when) + ": the formula does not apply (" + f + " = 0)");
                    return;
                }
                if (o instanceof Signs.Open) {
                    special.add(f);
                    admit(local, new Constraint(f, Relation.NONZERO), excluded);
                }
            }
        }
        regimes(problem, modes, local, when, excluded, substitution, fitted.get(), constants, special, names, out);
        if (depth >= MAX_DEPTH) {
            special.forEach(f -> notes.add("where " + f + " = 0 the solution takes another form, not derived here"));
            return;
        }
        for (ParamPolynomial f : special) {
            if (out.size() >= MAX_CASES) {
                notes.add("further special cases are not listed (at most " + MAX_CASES + " cases)");
                return;
            }
            Optional<Substitution> s = Substitution.solving(f, problem.parameters());
            if (s.isEmpty()) {
                notes.add("where " + new Constraint(f, Relation.ZERO) + " the solution takes another form, not derived here");
                continue;
            }
            Signs sub = base.copy();
            Signs.Outcome o = sub.impose(new Constraint(f, Relation.ZERO));
            if (o instanceof Signs.Never) {
                continue;
            }
            Optional<ParametricProblem> substituted = s.get().apply(problem);
            if (substituted.isEmpty()) {
                notes.add("where " + new Constraint(f, Relation.ZERO) + " the order drops; not derived here");
                continue;
            }
            List<Constraint> inner = new ArrayList<>(when);
            inner.add(new Constraint(f, Relation.ZERO));
            try {
                cases(substituted.get(), sub, inner, (substitution.isEmpty() ? "" : substitution + ", ") + s.get(),
                        depth + 1, out, notes);
            } catch (InputException e) {
                notes.add("where " + join(inner) + ": not derived (" + e.getMessage() + ")");
            }
        }
    }

    /** The coefficients in the basis, and the polynomials whose vanishing makes the fit fail. */
    private record Fitted(List<ParamPiece> pieces, List<ParamPolynomial> singular) { }

    private static Optional<Fitted> fit(ParametricProblem problem, ParamBasis basis, List<String> names, List<String> constants) {
        List<ParamBasis.Function> functions = basis.functions();
        List<ParamBasis.Function> unknowns = new ArrayList<>();
        for (ParamBasis.Function f : functions) {
            if (constants.isEmpty() || !basis.homogeneous(f)) {
                unknowns.add(f);
            }
        }
        List<List<ParamFunction>> rows = new ArrayList<>();
        List<ParamFunction> right = new ArrayList<>();
        int forcingRows = functions.size() - problem.order();
        int first = problem.domain() == Domain.DIFFERENCE ? Math.max(0, -problem.shift()) : 0;
        List<ParamFunction> coefficients = problem.coefficients().stream().map(a -> ModeFinder.over(a, names)).toList();
        for (int i = 0; i < forcingRows; i++) {
            List<ParamFunction> row = new ArrayList<>();
            for (ParamBasis.Function f : unknowns) {
                ParamFunction sum = ParamFunction.zero(names);
                for (int j = 0; j < coefficients.size(); j++) {
                    int at = problem.domain() == Domain.DIFFERENCE ? first + i + problem.shift() + j : i + j;
                    sum = sum.add(coefficients.get(j).multiply(basis.value(f, at)));
                }
                row.add(sum);
            }
            rows.add(row);
            ParamFunction g = ParamFunction.zero(names);
            for (ParamTerm t : problem.forcing()) {
                g = g.add(ParamBasis.forcing(problem.domain(), t, problem.domain() == Domain.DIFFERENCE ? first + i : i, names));
            }
            right.add(g);
        }
        for (ParamCondition c : problem.conditions()) {
            int at = problem.domain() == Domain.DIFFERENCE ? c.point().toBigInteger().intValueExact() : c.order();
            List<ParamFunction> row = new ArrayList<>();
            for (ParamBasis.Function f : unknowns) {
                row.add(basis.value(f, at));
            }
            rows.add(row);
            right.add(ModeFinder.over(c.value(), names));
        }
        Optional<ParamSystem.Solved> solved = ParamSystem.solve(rows, right);
        if (solved.isEmpty()) {
            return Optional.empty();
        }
        List<ParamPolynomial> singular = new ArrayList<>();
        singular.add(solved.get().determinant().numerator());
        singular.add(solved.get().determinant().denominator());
        List<ParamFunction> values = new ArrayList<>();
        int u = 0;
        int c = 0;
        for (ParamBasis.Function f : functions) {
            if (unknowns.contains(f)) {
                values.add(solved.get().x().get(u++));
            } else {
                values.add(ParamFunction.of(ParamPolynomial.variable(names,
                        names.indexOf(constants.get(c++)))));
            }
        }
        for (ParamFunction v : values) {
            singular.add(v.denominator());
        }
        List<ParamPiece> pieces = new ArrayList<>();
        for (int i = 0; i < functions.size(); i++) {
            ParamBasis.Function f = functions.get(i);
            if (f.odd()) {
                continue;
            }
            boolean pair = i + 1 < functions.size() && functions.get(i + 1).odd() && functions.get(i + 1).mode() == f.mode();
            ParamPiece piece = new ParamPiece(f.mode(), f.power(), values.get(i),
                    pair ? values.get(i + 1) : ParamFunction.zero(names), !basis.homogeneous(f));
            if (!piece.isZero()) {
                pieces.add(piece);
            }
        }
        return Optional.of(new Fitted(pieces, singular));
    }

    private static void regimes(ParametricProblem problem, List<ParamMode> modes, Signs signs, List<Constraint> when,
            List<Constraint> excluded, String substitution, Fitted fitted, List<String> constants, Set<ParamPolynomial> special,
            List<String> names, List<ParametricCase> out) {
        List<List<Regime>> combos = new ArrayList<>();
        combos.add(new ArrayList<>());
        for (ParamMode m : modes) {
            List<List<Regime>> next = new ArrayList<>();
            for (List<Regime> combo : combos) {
                List<Regime> choices = !m.pair() ? List.of(Regime.ROOT)
                        : m.discriminant() == null ? List.of(Regime.COMPLEX_PAIR)
                        : List.of(Regime.COMPLEX_PAIR, Regime.DOUBLE_ROOT, Regime.REAL_PAIR);
                for (Regime r : choices) {
                    List<Regime> c = new ArrayList<>(combo);
                    c.add(r);
                    next.add(c);
                }
            }
            combos = next;
        }
        boolean verified = ParamVerifier.verify(problem, modes, fitted.pieces(), names);
        for (List<Regime> combo : combos) {
            Signs s = signs.copy();
            List<Constraint> conditions = new ArrayList<>(when);
            boolean possible = true;
            for (int i = 0; i < modes.size() && possible; i++) {
                ParamMode m = modes.get(i);
                if (m.discriminant() == null) {
                    continue;
                }
                Relation r = combo.get(i) == Regime.REAL_PAIR ? Relation.POSITIVE
                        : combo.get(i) == Regime.DOUBLE_ROOT ? Relation.ZERO : Relation.NEGATIVE;
                if (r == Relation.ZERO && irreducible(m.discriminant()).stream().anyMatch(special::contains)) {
                    possible = false;
                    continue;
                }
                possible = admit(s, new Constraint(m.discriminant(), r), conditions);
            }
            if (!possible) {
                continue;
            }
            List<Optional<SquareRoot>> scales = new ArrayList<>();
            for (int i = 0; i < modes.size(); i++) {
                ParamMode m = modes.get(i);
                Regime r = combo.get(i);
                scales.add(r == Regime.REAL_PAIR ? Optional.of(SquareRoot.of(m.square()))
                        : r != Regime.COMPLEX_PAIR ? Optional.empty()
                        : problem.domain() == Domain.DIFFERENTIAL ? Optional.of(SquareRoot.of(m.square().negate()))
                        : Optional.of(new SquareRoot(ParamFunction.one(names), m.centre().pow(2).subtract(m.square()))));
            }
            out.add(new ParametricCase(conditions, excluded, substitution, modes, combo, scales, fitted.pieces(), constants,
                    verified));
        }
    }

    /** Imposes c; adds its open form to {@code into}; false when it cannot hold. */
    private static boolean admit(Signs signs, Constraint c, List<Constraint> into) {
        Signs.Outcome o = signs.impose(c);
        if (o instanceof Signs.Never) {
            return false;
        }
        if (o instanceof Signs.Open open) {
            into.add(open.constraint());
        }
        return true;
    }

    private static List<ParamPolynomial> irreducible(ParamPolynomial p) {
        if (p.isConstant()) {
            return List.of();
        }
        List<ParamPolynomial> out = new ArrayList<>();
        List<ParamFactor> factors = JasMultivariate.factor(p);
        for (ParamFactor f : factors.subList(1, factors.size())) {
            out.add(f.polynomial());
        }
        return out;
    }

    private static String join(List<Constraint> conditions) {
        return String.join(" and ", conditions.stream().map(Constraint::toString).toList());
    }
}
