package dev.rootform.export.notation;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.parse.ProblemParser;
import java.util.ArrayList;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Property (jqwik): an equation printed by {@link EquationText#equation} reads back, through the
 * parser, as the same equation: parse ∘ print is the identity on equations in normal form, with
 * rational coefficients and polynomial × exponential × sin/cos forcing.
 */
class EquationRoundTripPropertyTest {
    @Property(tries = 300)
    void printedEquationsParseBackToThemselves(@ForAll("equations") LinearEquation eq) {
        String text = EquationText.equation(eq);
        assertEquals(eq, ProblemParser.parse(text, List.of(), null).equation(), text);
    }

    @Provide
    Arbitrary<LinearEquation> equations() {
        return Arbitraries.of(Domain.values()).flatMap(domain -> Combinators.combine(
                rationals().list().ofMinSize(1).ofMaxSize(5), nonzero(), forcing(domain).list().ofMaxSize(3))
                .as((low, lead, forcing) -> {
                    List<Rational> coefficients = new ArrayList<>(low);
                    coefficients.add(lead);
                    String function = domain == Domain.DIFFERENCE ? "x" : "y";
                    String variable = domain == Domain.DIFFERENCE ? "n" : "t";
                    return new LinearEquation(domain, function, variable, coefficients, 0, combined(forcing));
                }));
    }

    /** The terms with like terms added, as the parser's normal form holds them (no zero and no repeated shape). */
    private static List<ForcingTerm> combined(List<ForcingTerm> terms) {
        List<ForcingTerm> out = new ArrayList<>();
        for (ForcingTerm t : terms) {
            if (out.stream().noneMatch(o -> o.power() == t.power() && o.exponential().equals(t.exponential())
                    && o.oscillation() == t.oscillation() && o.frequency().equals(t.frequency()))) {
                out.add(t);
            }
        }
        return out.stream().sorted(java.util.Comparator.comparing(ForcingTerm::exponential)
                .thenComparing(ForcingTerm::oscillation).thenComparing(ForcingTerm::frequency)
                .thenComparingInt(ForcingTerm::power)).toList();
    }

    private static Arbitrary<ForcingTerm> forcing(Domain domain) {
        Arbitrary<Rational> exponential = domain == Domain.DIFFERENCE
                ? Arbitraries.of(Rational.ONE, Rational.of(2), Rational.of(1, 3), Rational.of(-2))
                : Arbitraries.of(Rational.ZERO, Rational.of(-1), Rational.of(1, 2));
        Arbitrary<ForcingTerm.Oscillation> oscillation = domain == Domain.DIFFERENCE
                ? Arbitraries.just(ForcingTerm.Oscillation.NONE) : Arbitraries.of(ForcingTerm.Oscillation.values());
        return Combinators.combine(nonzero(), Arbitraries.integers().between(0, 3), exponential, oscillation,
                Arbitraries.integers().between(1, 5)).as((c, p, e, o, w) -> new ForcingTerm(c, p, e, o,
                        o == ForcingTerm.Oscillation.NONE ? Rational.ZERO : Rational.of(w), false));
    }

    private static Arbitrary<Rational> rationals() {
        return Combinators.combine(Arbitraries.integers().between(-20, 20), Arbitraries.integers().between(1, 6))
                .as((p, q) -> Rational.of(p, q));
    }

    private static Arbitrary<Rational> nonzero() {
        return rationals().filter(r -> !r.isZero());
    }
}
