package dev.rootform.export.notation;

/**
 * Presentation MathML (the MathML Core elements mrow, mi, mn, mo, msup, msub, mfrac, msqrt,
 * munder): every atom is an element, every operand of a two-child element is wrapped in an
 * {@code mrow}, so written pieces can be concatenated freely. Names are XML-escaped.
 *
 * @since 0.2
 */
public final class MathMlNotation implements Notation {
    public static final MathMlNotation INSTANCE = new MathMlNotation();
    /** U+2062 INVISIBLE TIMES, for products written by juxtaposition. */
    private static final String INVISIBLE_TIMES = "<mo>&#x2062;</mo>";
    /** U+2061 FUNCTION APPLICATION, between a function name and its argument. */
    private static final String APPLY = "<mo>&#x2061;</mo>";

    private MathMlNotation() {
    }

    @Override
    public String fraction(String numerator, String denominator) {
        return "<mfrac>" + row(numerator) + row(denominator) + "</mfrac>";
    }

    @Override
    public String sqrt(String radicand) {
        return "<msqrt>" + radicand + "</msqrt>";
    }

    @Override
    public String times(String left, String right) {
        return left + "<mo>&#x22C5;</mo>" + right;
    }

    @Override
    public String implicit(String left, String right) {
        return left + INVISIBLE_TIMES + right;
    }

    @Override
    public String power(String base, String exponent) {
        return "<msup>" + row(base) + row(exponent) + "</msup>";
    }

    @Override
    public String function(String name, String argument) {
        return "<mi>" + name + "</mi>" + APPLY + parens(argument);
    }

    @Override
    public String parens(String inner) {
        return "<mrow><mo>(</mo>" + inner + "<mo>)</mo></mrow>";
    }

    @Override
    public String clarify(String inner) {
        return row(inner);
    }

    @Override
    public String plus() {
        return "<mo>+</mo>";
    }

    @Override
    public String minus() {
        return "<mo>&#x2212;</mo>";
    }

    @Override
    public String conjugateSum(String polynomial, String summand) {
        return "<munder><mo>&#x2211;</mo><mrow>" + polynomial + "<mo>=</mo><mn>0</mn></mrow></munder>" + summand;
    }

    /** {@code C1} becomes C with subscript 1; other names stay one identifier. */
    @Override
    public String constant(String name) {
        if (name.matches("[A-Za-z]+\\d+")) {
            String letters = name.replaceAll("\\d+$", "");
            return "<msub>" + name(letters) + number(name.substring(letters.length())) + "</msub>";
        }
        return name(name);
    }

    @Override
    public String pi() {
        return "<mi>&#x3C0;</mi>";
    }

    @Override
    public String lambda() {
        return "<mi>&#x3BB;</mi>";
    }

    @Override
    public String number(String digits) {
        return "<mn>" + digits + "</mn>";
    }

    @Override
    public String name(String identifier) {
        return "<mi>" + Xml.escape(identifier) + "</mi>";
    }

    @Override
    public String negate(String body) {
        return "<mo>&#x2212;</mo>" + body;
    }

    private static String row(String inner) {
        return "<mrow>" + inner + "</mrow>";
    }
}
