package dev.rootform.symbolic.claim;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.parse.NumberLiteral;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Splits a claimed closed form into tokens. Besides ASCII it reads the tool's own text output and
 * common typeset forms: {@code ·}, {@code ×} and {@code ⋅} for times, {@code −} for minus,
 * {@code √}, {@code Σ}, {@code ≥}, Greek letters (each one a name of its own, so {@code πn} is π
 * times n) and superscript digits ({@code t²} is {@code t^2}). Runs of ASCII letters form one name;
 * the parser splits runs such as {@code pin} into known names.
 */
final class ClaimLexer {
    private static final String SUPERSCRIPTS = "⁰¹²³⁴⁵⁶⁷⁸⁹";
    private static final Map<Character, ClaimToken.Kind> SINGLE = Map.ofEntries(
            Map.entry('+', ClaimToken.Kind.PLUS), Map.entry('-', ClaimToken.Kind.MINUS),
            Map.entry('\u2212', ClaimToken.Kind.MINUS), Map.entry('*', ClaimToken.Kind.TIMES),
            Map.entry('·', ClaimToken.Kind.TIMES), Map.entry('×', ClaimToken.Kind.TIMES),
            Map.entry('\u22c5', ClaimToken.Kind.TIMES), Map.entry('/', ClaimToken.Kind.DIVIDE),
            Map.entry('÷', ClaimToken.Kind.DIVIDE), Map.entry('^', ClaimToken.Kind.CARET),
            Map.entry('(', ClaimToken.Kind.LPAREN), Map.entry(')', ClaimToken.Kind.RPAREN),
            Map.entry('[', ClaimToken.Kind.LBRACKET), Map.entry(']', ClaimToken.Kind.RBRACKET),
            Map.entry('{', ClaimToken.Kind.LBRACE), Map.entry('}', ClaimToken.Kind.RBRACE),
            Map.entry('_', ClaimToken.Kind.UNDERSCORE), Map.entry('=', ClaimToken.Kind.EQUALS),
            Map.entry('>', ClaimToken.Kind.GREATER), Map.entry('≥', ClaimToken.Kind.AT_LEAST),
            Map.entry('√', ClaimToken.Kind.SQRT), Map.entry('Σ', ClaimToken.Kind.SIGMA),
            Map.entry('∑', ClaimToken.Kind.SIGMA), Map.entry(';', ClaimToken.Kind.SEPARATOR),
            Map.entry(',', ClaimToken.Kind.SEPARATOR), Map.entry('\n', ClaimToken.Kind.SEPARATOR),
            Map.entry('\'', ClaimToken.Kind.PRIME), Map.entry('!', ClaimToken.Kind.BANG));

    private final String source;
    private int position;

    ClaimLexer(String source) {
        this.source = source;
    }

    /** All tokens, ending with an {@link ClaimToken.Kind#END} token. */
    List<ClaimToken> tokens() {
        List<ClaimToken> tokens = new ArrayList<>();
        while (true) {
            while (position < source.length() && source.charAt(position) != '\n'
                    && Character.isWhitespace(source.charAt(position))) {
                position++;
            }
            if (position >= source.length()) {
                tokens.add(new ClaimToken(ClaimToken.Kind.END, "", position, position, null));
                return tokens;
            }
            next(tokens);
        }
    }

    private void next(List<ClaimToken> tokens) {
        char c = source.charAt(position);
        int start = position;
        if (Character.isDigit(c) || c == '.') {
            tokens.add(number());
        } else if (c == '>' && position + 1 < source.length() && source.charAt(position + 1) == '=') {
            position += 2;
            tokens.add(new ClaimToken(ClaimToken.Kind.AT_LEAST, ">=", start, position, null));
        } else if (SUPERSCRIPTS.indexOf(c) >= 0) {
            superscript(tokens);
        } else if (c < 128 && Character.isLetter(c)) {
            while (position < source.length() && source.charAt(position) < 128 && Character.isLetter(source.charAt(position))) {
                position++;
            }
            tokens.add(new ClaimToken(ClaimToken.Kind.NAME, source.substring(start, position), start, position, null));
        } else if (SINGLE.containsKey(c)) {
            position++;
            tokens.add(new ClaimToken(SINGLE.get(c), String.valueOf(c), start, position, null));
        } else if (Character.isLetter(c)) {
            position++;
            tokens.add(new ClaimToken(ClaimToken.Kind.NAME, String.valueOf(c), start, position, null));
        } else {
            throw new InputException("unexpected character '" + c + "' in the claim", source, position);
        }
    }

    private ClaimToken number() {
        NumberLiteral n = NumberLiteral.read(source, position, source.length(), "number in the claim");
        int start = position;
        position = n.end();
        return new ClaimToken(ClaimToken.Kind.NUMBER, n.text(), start, position, n.value());
    }

    /** t² → t ^ 2: a caret token and the number of the superscript digits. */
    private void superscript(List<ClaimToken> tokens) {
        int start = position;
        StringBuilder digits = new StringBuilder();
        while (position < source.length() && SUPERSCRIPTS.indexOf(source.charAt(position)) >= 0) {
            digits.append(SUPERSCRIPTS.indexOf(source.charAt(position)));
            position++;
        }
        tokens.add(new ClaimToken(ClaimToken.Kind.CARET, "^", start, start, null));
        tokens.add(new ClaimToken(ClaimToken.Kind.NUMBER, digits.toString(), start, position, Rational.parse(digits.toString())));
    }
}
