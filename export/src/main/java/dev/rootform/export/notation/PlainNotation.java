package dev.rootform.export.notation;

/**
 * Plain Unicode text: {@code 1/5·√5}, {@code e^(-t)}, {@code cos(2t)}, {@code Σ_{λ^3 - λ - 1 = 0} ...}.
 * Exponents other than a single character or a run of digits are parenthesised.
 *
 * @since 0.1
 */
final class PlainNotation implements Notation {
    static final PlainNotation INSTANCE = new PlainNotation();

    private PlainNotation() {
    }

    @Override
    public String fraction(String numerator, String denominator) {
        return numerator + "/" + denominator;
    }

    @Override
    public String sqrt(String radicand) {
        return "√" + radicand;
    }

    @Override
    public String times(String left, String right) {
        return left + "·" + right;
    }

    @Override
    public String implicit(String left, String right) {
        return left + right;
    }

    @Override
    public String power(String base, String exponent) {
        boolean bare = exponent.length() == 1 || exponent.chars().allMatch(Character::isDigit);
        return base + "^" + (bare ? exponent : parens(exponent));
    }

    @Override
    public String function(String name, String argument) {
        return name + parens(argument);
    }

    @Override
    public String parens(String inner) {
        return "(" + inner + ")";
    }

    @Override
    public String clarify(String inner) {
        return parens(inner);
    }

    @Override
    public String plus() {
        return " + ";
    }

    @Override
    public String minus() {
        return " - ";
    }

    @Override
    public String conjugateSum(String polynomial, String summand) {
        return "Σ_{" + polynomial + " = 0} " + summand;
    }

    @Override
    public String constant(String name) {
        return name;
    }

    @Override
    public String pi() {
        return "π";
    }

    @Override
    public String lambda() {
        return "λ";
    }
}
