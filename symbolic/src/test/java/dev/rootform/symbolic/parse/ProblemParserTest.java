package dev.rootform.symbolic.parse;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.Condition;
import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.model.ForcingTerm.Oscillation;
import dev.rootform.symbolic.model.ForcingTerm;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.model.LinearEquation;
import dev.rootform.symbolic.model.Problem;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

class ProblemParserTest {

    private static LinearEquation equation(String text) {
        return ProblemParser.parse(text, List.of(), null).equation();
    }

    private static List<Rational> coefficients(String... values) {
        return Arrays.stream(values).map(Rational::parse).toList();
    }

    private static Rational r(String value) {
        return Rational.parse(value);
    }

    private static ForcingTerm polynomial(String c, int power, Domain domain) {
        Rational neutral = domain == Domain.DIFFERENCE ? Rational.ONE : Rational.ZERO;
        return new ForcingTerm(r(c), power, neutral, Oscillation.NONE, Rational.ZERO, false);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "y'' + 2y' + 5y = 0                 | 5 2 1",
        "(D^2 + 2D + 5) y = 0               | 5 2 1",
        "D^2 y + 2 D y + 5y = 0             | 5 2 1",
        "d2y/dt2 + 2 dy/dt + 5y = 0         | 5 2 1",
        "y''(t) + 2y'(t) + 5y(t) = 0        | 5 2 1",
        "2y'' = -3y' - y                    | 1 3 2",
        "y^(4) - y = 0                      | -1 0 0 0 1",
        "y''' = 0                           | 0 0 0 1",
        "y''/2 + (1/3 + 2) y' = 0           | 0 7/3 1/2",
        "0.1y' + 1e-3 y = 0                 | 1/1000 1/10",
        "(D+1)^2 (D^2+4) y = 0              | 4 8 5 2 1",
        "-(D - 3/4)(y) = 0                  | 3/4 -1",
        "2(y'' - y) + y = 0                 | -1 0 2",
    })
    void differentialCoefficients(String text, String expected) {
        LinearEquation e = equation(text);
        assertEquals(Domain.DIFFERENTIAL, e.domain());
        assertEquals("y", e.function());
        assertEquals("t", e.variable());
        assertEquals(0, e.shift());
        assertEquals(coefficients(expected.split(" ")), e.coefficients());
        assertTrue(e.isHomogeneous());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "x[n+2] = x[n+1] + x[n]          | n | 0  | -1 -1 1",
        "x[n] = 3x[n-1] - 2x[n-2]        | n | -2 | 2 -3 1",
        "(E^2 - E - 1) x = 0             | n | 0  | -1 -1 1",
        "E^2 x - E x - x = 0             | n | 0  | -1 -1 1",
        "a[k+1] = 2a[k]                  | k | 0  | -2 1",
        "2 x[n-1] + x[n+1] = 0           | n | -1 | 2 0 1",
        "(E-2)^2 x[n-1] = 0              | n | -1 | 4 -4 1",
        "x[n+3] = 2x[n+1]                | n | 0  | 0 -2 0 1",
        "(E^2 - 2E) x = 0                | n | 0  | 0 -2 1",
        "E (E-2) x = 0                   | n | 0  | 0 -2 1",
    })
    void recurrenceCoefficients(String text, String index, int shift, String expected) {
        LinearEquation e = equation(text);
        assertEquals(Domain.DIFFERENCE, e.domain());
        assertEquals(index, e.variable());
        assertEquals(shift, e.shift());
        assertEquals(coefficients(expected.split(" ")), e.coefficients());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "(E-2)^2 x = 3^n                        | x[n+2] - 4x[n+1] + 4x[n] = 3^n",
        "(D+1)^2 (D^2+4) y = t e^(-t)           | y'''' + 2y''' + 5y'' + 8y' + 4y = t*exp(-t)",
        "(D^2 + 2D + 5) y = sin(3t)             | d^2y/dt^2 + 2 dy/dt = -5y + sin(3 t)",
        // a name that is no function before parentheses is a factor, and ^ binds to the parentheses
        // only, as after a number (common practice: exponentiation before multiplication)
        "D (D+1)^2 y = 0                        | y''' + 2y'' + y' = 0",
        "E (E-2)^2 x = 0                        | x[n+3] - 4x[n+2] + 4x[n+1] = 0",
        "y' + y = t (3)^2                       | y' + y = 9*t",
        "x[n+1] = x[n]/2 + n (1/3)^n            | x[n+1] = x[n]/2 + n*(1/3)^n",
        "y' + y = t (t+1)^2                     | y' + y = t*(t+1)*(t+1)",
    })
    void operatorFormEqualsWrittenForm(String operatorForm, String writtenForm) {
        assertEquals(equation(writtenForm), equation(operatorForm));
    }

    @Test
    void indexNameAndForcingInThatIndex() {
        LinearEquation e = equation("a[k+1] = 2a[k] + 1 + k");
        assertEquals("a", e.function());
        assertEquals("k", e.variable());
        assertEquals(List.of(polynomial("1", 0, Domain.DIFFERENCE), polynomial("1", 1, Domain.DIFFERENCE)),
                e.forcing());
    }

    @Test
    void exponentLinearInTheIndex() {
        // (2/3)^(2n-1) = 3/2 (4/9)^n
        assertEquals(List.of(new ForcingTerm(r("3/2"), 0, r("4/9"), Oscillation.NONE, Rational.ZERO, false)),
                equation("x[n+1] = x[n] + (2/3)^(2n-1)").forcing());
    }

    @Test
    void cubeOfCosineIsReduced() {
        // cos^3 t = 3/4 cos t + 1/4 cos 3t
        assertEquals(List.of(new ForcingTerm(r("3/4"), 0, r("0"), Oscillation.COS, r("1"), false),
                new ForcingTerm(r("1/4"), 0, r("0"), Oscillation.COS, r("3"), false)),
                equation("y'' = cos(t)^3").forcing());
    }

    @Test
    void explicitArgumentNamesTheVariable() {
        LinearEquation e = equation("y''(x) + y(x) = x");
        assertEquals("x", e.variable());
        assertEquals(List.of(polynomial("1", 1, Domain.DIFFERENTIAL)), e.forcing());
    }

    @ParameterizedTest
    @ValueSource(strings = {"e", "pi", "D", "E", "sin", "exp", "log"})
    void fixedNameCannotBeTheVariable(String name) {
        // u(e) = e^(-e) + e·e^(-e) or y(pi) = cos(pi) would read as values of the constants
        InputException x = assertThrows(InputException.class,
                () -> ProblemParser.parse("u'' + 2u' + u = 0", List.of(), name));
        assertTrue(x.getMessage().contains("cannot name the variable"), x.getMessage());
        InputException leibniz = assertThrows(InputException.class,
                () -> ProblemParser.parse("du/d" + name + " + u = 0", List.of(), null));
        assertTrue(leibniz.getMessage().contains("cannot name the variable"), leibniz.getMessage());
    }

    @Test
    void variableParameterAndOtherFunctionName() {
        LinearEquation e = ProblemParser.parse("u'' + u = s", List.of(), "s").equation();
        assertEquals("u", e.function());
        assertEquals("s", e.variable());
        assertEquals(coefficients("1", "0", "1"), e.coefficients());
        assertEquals(List.of(polynomial("1", 1, Domain.DIFFERENTIAL)), e.forcing());
    }

    @Test
    void leibnizVariableIsUsed() {
        assertEquals("x", equation("dy/dx = y").variable());
    }

    @Test
    void forcingMovesToTheRight() {
        LinearEquation e = equation("y'' - t = -y + 3t^2 - 1");
        assertEquals(coefficients("1", "0", "1"), e.coefficients());
        assertEquals(List.of(polynomial("-1", 0, Domain.DIFFERENTIAL), polynomial("1", 1, Domain.DIFFERENTIAL),
                polynomial("3", 2, Domain.DIFFERENTIAL)), e.forcing());
    }

    @Test
    void productOfPolynomialExponentialAndOscillation() {
        LinearEquation e = equation("y'' + y = t e^(-t) + 2sin(3t)");
        assertEquals(List.of(
                new ForcingTerm(r("1"), 1, r("-1"), Oscillation.NONE, Rational.ZERO, false),
                new ForcingTerm(r("2"), 0, r("0"), Oscillation.SIN, r("3"), false)), e.forcing());
    }

    @Test
    void recurrenceExponentialsCombine() {
        LinearEquation e = equation("x[n+1] = 2x[n] + 2^n*n + 3^n*2^n");
        assertEquals(coefficients("-2", "1"), e.coefficients());
        assertEquals(List.of(
                new ForcingTerm(r("1"), 1, r("2"), Oscillation.NONE, Rational.ZERO, false),
                new ForcingTerm(r("1"), 0, r("6"), Oscillation.NONE, Rational.ZERO, false)), e.forcing());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "y' - y = e^(3t/2)               | 1 | 0 | 3/2",
        "y' - y = exp(-2t)               | 1 | 0 | -2",
        "y' - y = e^t * e^(2t) / 4       | 1/4 | 0 | 3",
        "y' - y = (t + 1)^2 - t^2 - 2t   | 1 | 0 | 0",
        "x[n+1] - x[n] = (1/3)^n         | 1 | 0 | 1/3",
        "x[n+1] - x[n] = 2^(n+1)         | 2 | 0 | 2",
        "x[n+1] - x[n] = (-1)^n n^2      | 1 | 2 | -1",
        "(E-2)^2 x = 3^n                 | 1 | 0 | 3",
    })
    void singleForcingTerm(String text, String coefficient, int power, String exponential) {
        List<ForcingTerm> forcing = equation(text).forcing();
        assertEquals(List.of(new ForcingTerm(r(coefficient), power, r(exponential), Oscillation.NONE,
                Rational.ZERO, false)), forcing);
    }

    @Test
    void piMultipleFrequency() {
        assertEquals(List.of(new ForcingTerm(r("1"), 0, r("1"), Oscillation.COS, r("1/3"), true)),
                equation("x[n+1] = x[n] + cos(pi n/3)").forcing());
        assertEquals(List.of(new ForcingTerm(r("1"), 0, r("0"), Oscillation.COS, r("2"), true)),
                equation("y' = cos(2*pi*t)").forcing());
    }

    @Test
    void productToSum() {
        // sin(3t)cos(t) = (sin 4t + sin 2t)/2 ; cos(t)sin(3t) the same after sin(-2t) = -sin(2t)
        List<ForcingTerm> expected = List.of(
                new ForcingTerm(r("1/2"), 0, r("0"), Oscillation.SIN, r("2"), false),
                new ForcingTerm(r("1/2"), 0, r("0"), Oscillation.SIN, r("4"), false));
        assertEquals(expected, equation("y' = sin(3t) cos(t)").forcing());
        assertEquals(expected, equation("y' = cos(t) sin(3t)").forcing());
        // sin^2(t) = 1/2 - cos(2t)/2
        assertEquals(List.of(polynomial("1/2", 0, Domain.DIFFERENTIAL),
                new ForcingTerm(r("-1/2"), 0, r("0"), Oscillation.COS, r("2"), false)),
                equation("y' = sin(t)^2").forcing());
    }

    @Test
    void degenerateAndCancellingTermsVanish() {
        assertEquals(List.of(polynomial("3", 0, Domain.DIFFERENTIAL)),
                equation("y' = cos(0*t) + sin(0 t) + 2").forcing());
        assertTrue(equation("y' + t = t + sin(t) - sin(t)").isHomogeneous());
        assertEquals(List.of(new ForcingTerm(r("1"), 0, r("0"), Oscillation.COS, r("2"), false),
                new ForcingTerm(r("-1"), 0, r("0"), Oscillation.SIN, r("2"), false)),
                equation("y' = sin(-2t) + cos(-2t)").forcing());
    }

    @Test
    void conditionsInTextAndGiven() {
        Problem p = ProblemParser.parse("y''' + y = 0; y(0)=1; y'(0) = 0;; y''(1.5)=-2;",
                List.of("y(0.25) = -3/4", "y^(2)(0)=1; y'(1) = (1/3+2)"), null);
        assertEquals(List.of(
                new Condition(0, r("0"), r("1")),
                new Condition(1, r("0"), r("0")),
                new Condition(2, r("3/2"), r("-2")),
                new Condition(0, r("1/4"), r("-3/4")),
                new Condition(2, r("0"), r("1")),
                new Condition(1, r("1"), r("7/3"))), p.conditions());
    }

    @Test
    void conditionPointsThatAreMultiplesOfPi() {
        Problem p = ProblemParser.parse("y'' + y = 0; y(pi) = 1; y'(-3*pi/4) = 0", List.of("y(2pi) = 2"), null);
        assertEquals(List.of(new Condition(0, r("1"), true, r("1")), new Condition(1, r("-3/4"), true, r("0")),
                new Condition(0, r("2"), true, r("2"))), p.conditions());
        assertEquals(List.of("π", "-3π/4", "2π"), p.conditions().stream().map(Condition::point).toList());
    }

    @Test
    void recurrenceConditions() {
        Problem p = ProblemParser.parse("x[n+2] = x[n+1] + x[n]; x[0]=0; x[5]=8", List.of("x[1]=2^10"), null);
        assertEquals(List.of(new Condition(0, r("0"), r("0")), new Condition(0, r("5"), r("8")),
                new Condition(0, r("1"), r("1024"))), p.conditions());
    }

    private static void assertError(String text, String message, int position) {
        InputException e = assertThrows(InputException.class, () -> ProblemParser.parse(text, List.of(), null));
        assertTrue(e.getMessage().contains(message), () -> "message was: " + e.getMessage());
        assertEquals(position, e.position(), () -> "message was: " + e.getMessage());
        assertEquals(text, e.source());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', quoteCharacter = '`', value = {
        "y'' + (y = 0                  | unbalanced '('                      | 6",
        "y'' + y) = 0                  | unbalanced ')'                      | 7",
        "x[n+1 = x[n]                  | unbalanced '['                      | 1",
        "y'' + y + z = 0               | unknown name 'z'                    | 10",
        "y'' + y                       | expected '=' in the equation        | 7",
        "y*y' = 0                      | nonlinear term: y*y'                | 0",
        "y' + y^2 = 0                  | nonlinear term: y^2                 | 5",
        "y' = sin(y)                   | nonlinear term: sin(y)              | 5",
        "y' = 1/y                      | nonlinear term: 1/y                 | 5",
        "y'' + t*y' = 0                | variable coefficient: t*y'          | 6",
        "x[n+1] = n x[n]               | variable coefficient: n x[n]        | 9",
        "x[n+1/2] = x[n]               | non-integer shift x[n+1/2] is out of scope | 0",
        "x[2n] = x[n]                  | index must be n plus a constant     | 0",
        "   ;  ;                       | empty input                         | 0",
        "3 = 4                         | equation has no unknown             | -1",
        "y' + z' = 0                   | mixes y and z: one unknown function expected | 5",
        "pi*y + y' = 0                 | pi: coefficient must be rational    | 0",
        "y' = e                        | e: coefficient must be rational     | 5",
        "y' = pi t                     | pi: coefficient must be rational    | 5",
        "x[n+1] = x[n] + e^n           | e^n: base must be rational          | 16",
        "y' = 2^t                      | 2^t: use e^(c t) with rational c    | 5",
        "y' = e^(t+1)                  | e^(t+1): coefficient must be rational | 5",
        "x[n+1] = x[n] + 1/n           | 1/n is out of scope                 | 16",
        "y' = tan(t)                   | tan(t) is out of scope              | 5",
        "y' = t^(1/2)                  | t^(1/2) is out of scope             | 5",
        "y' = sqrt(t)                  | sqrt(t) is out of scope             | 5",
        "x[n+1] = x[n] + log(n)        | log(n) is out of scope              | 16",
        "x[n+1] = x[n] + n!            | factorial n! is out of scope        | 16",
        "y' = sin(t) cos(pi t)         | frequencies must be all rational    | 5",
        "y' = sin(t + 1)               | sin(t + 1) is out of scope          | 5",
        "y - 2 = t                     | order 0                             | 0",
        "y' - y' = 1                   | cancels out                         | 0",
        "y' = 2 # 3                    | unexpected character '#'            | 7",
        "y' = = 3                      | unexpected '='                      | 5",
        "y' = 3 +                      | unexpected end of input             | 8",
        "y' = 1/0                      | division by zero                    | 7",
        "(D+1) y = D                   | operator D must be applied          | 10",
        "(D+1)(y + 1) = 0              | operator must be applied to the unknown alone | 0",
        "(E^2 - D) x = 0               | operator D does not fit a recurrence | 7",
        "x[n+1] = y'                   | mixes x and y                        | 9",
        "d2y/dt3 = 0                   | orders 2 and 3 differ                | 0",
        "y'(x) = y(t)                  | the variable is x, not t             | 8",
        "y' = 1e999999999              | number 1e999999999 is out of range   | 5",
        "x[n+2000] = x[n]              | shift x[n+2000] is above the order limit 200 | 0",
        "d^2y/dt^2 + 5 y == 0          | write '=' for an equation            | 16",
        "y' = 1.5.2 y                  | malformed number '1.5.2'             | 5",
        "y' = 1.5 2 y                  | two numbers side by side             | 9",
        "y^(201) = y                   | order above the limit 200            | 1",
        "x[n+1] = x[n] + n^101         | too large                            | 16",
        "e''' + 3e'' + e = 1           | e is Euler's number and cannot name the unknown function | 0",
        "e[n+1] = e[n] + 1             | e is Euler's number                  | 0",
    })
    void errors(String text, String message, int position) {
        assertError(text, message, position);
    }

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "x[n+1] = x[n]; x[1.5] = 2     | condition x[1.5]: index must be an integer | 17",
        "y'' + y = 0; y^(3)(0) = 1     | condition order 3 >= equation order 2       | 13",
        "y'' + y = 0; y''(0) = 1       | condition order 2 >= equation order 2       | 13",
        "y'' + y = 0; z(0) = 1         | condition z(0): expected y(0) = value       | 13",
        "x[n+1] = x[n]; x'(0) = 1      | derivatives need a differential equation    | 15",
        "y'' + y = 0; y[0] = 1         | brackets need a recurrence                  | 13",
        "y'' + y = 0; y(0) = t         | condition value must be a rational constant | 20",
        "y'' + y = 0; y(0)             | expected '=' in the condition               | 17",
    })
    void conditionErrors(String text, String message, int position) {
        assertError(text, message, position);
    }

    @Test
    void errorInGivenPointsIntoThatString() {
        InputException e = assertThrows(InputException.class,
                () -> ProblemParser.parse("y'' + y = 0", List.of("y(0) = 1", "y'(0) = (2"), null));
        assertEquals("y'(0) = (2", e.source());
        assertEquals(8, e.position());
        assertTrue(e.getMessage().contains("unbalanced '('"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"y'' + y = 0;", ";y'' + y = 0", "  y''+y=0 ; ; "})
    void emptySegmentsAreIgnored(String text) {
        Problem p = ProblemParser.parse(text, List.of(" "), null);
        assertEquals(coefficients("1", "0", "1"), p.equation().coefficients());
        assertTrue(p.conditions().isEmpty());
    }
}
