package dev.rootform.symbolic.matrix;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads matrices and vectors written as JSON arrays of exact numbers: {@code [[0, 1], [-5, -2]]},
 * {@code [1, 0.5]}. An entry is a JSON number (integer or decimal, read exactly: 0.1 = 1/10) or a
 * JSON string holding a number or a fraction ({@code "3/4"}). Errors name the matrix, the entry
 * (row and column, from 1) and the column of the text.
 *
 * @since 0.3
 */
public final class MatrixText {
    /** Largest decimal exponent accepted in an entry, so that 1e999999999 cannot exhaust memory. */
    private static final int MAX_EXPONENT = 1000;

    private final String name;
    private final String text;
    private int pos;

    private MatrixText(String name, String text) {
        this.name = name;
        this.text = text;
    }

    /**
     * A matrix: an array of rows, each an array of the same non-zero number of entries.
     *
     * @param name the matrix's name in messages, e.g. {@code A}
     * @throws InputException naming the matrix, the entry and the place
     */
    public static RationalMatrix matrix(String name, String text) {
        MatrixText reader = new MatrixText(name, text);
        List<List<Rational>> rows = new ArrayList<>();
        List<Integer> starts = new ArrayList<>();
        reader.expect('[', "'[' to open the matrix");
        if (reader.peek() != '[') {
            throw reader.error("is not a matrix: write its rows as arrays, e.g. [[1, 0], [0, 1]]");
        }
        do {
            starts.add(reader.skipSpaces());
            rows.add(reader.row(rows.size() + 1));
        } while (reader.comma());
        reader.expect(']', "',' or ']' after row " + rows.size());
        reader.end();
        int columns = rows.get(0).size();
        for (int i = 1; i < rows.size(); i++) {
            if (rows.get(i).size() != columns) {
                throw new InputException(name + ": row " + (i + 1) + " has " + rows.get(i).size() + " entries, row 1 has "
                        + columns, text, starts.get(i));
            }
        }
        return RationalMatrix.of(rows, columns);
    }

    /**
     * A vector: one array of entries.
     *
     * @throws InputException naming the vector, the entry and the place
     */
    public static List<Rational> vector(String name, String text) {
        MatrixText reader = new MatrixText(name, text);
        reader.skipSpaces();
        List<Rational> v = reader.entries(0);
        reader.end();
        return v;
    }

    private List<Rational> row(int index) {
        if (peek() != '[') {
            throw error("row " + index + " must be an array such as [1, 2]");
        }
        return entries(index);
    }

    /** '[' entry (',' entry)* ']'; {@code row} 0 for a vector. */
    private List<Rational> entries(int row) {
        expect('[', "'['");
        List<Rational> values = new ArrayList<>();
        if (peek() == ']') {
            throw error(row == 0 ? "is empty" : "row " + row + " is empty");
        }
        do {
            values.add(entry(row, values.size() + 1));
        } while (comma());
        expect(']', "',' or ']' after entry " + place(row, values.size()));
        return values;
    }

    private Rational entry(int row, int column) {
        int start = skipSpaces();
        String token;
        if (peek() == '"') {
            int close = text.indexOf('"', start + 1);
            if (close < 0) {
                throw error("unterminated string in entry " + place(row, column));
            }
            token = text.substring(start + 1, close);
            pos = close + 1;
        } else {
            while (pos < text.length() && "[],\" \t\r\n".indexOf(text.charAt(pos)) < 0) {
                pos++;
            }
            token = text.substring(start, pos);
        }
        try {
            if (token.isBlank() || exponentTooLarge(token)) {
                throw new NumberFormatException(token);
            }
            return Rational.parse(token);
        } catch (NumberFormatException | ArithmeticException e) {
            throw new InputException(name + ": entry " + place(row, column) + " '" + token + "' is not an exact number"
                    + " (write integers, decimals or fractions such as \"3/4\")", text, start);
        }
    }

    private static boolean exponentTooLarge(String token) {
        int e = Math.max(token.indexOf('e'), token.indexOf('E'));
        if (e < 0) {
            return false;
        }
        String digits = token.substring(e + 1).replaceAll("[^0-9]", "");
        return digits.length() > 4 || (!digits.isEmpty() && Integer.parseInt(digits) > MAX_EXPONENT);
    }

    private static String place(int row, int column) {
        return row == 0 ? "[" + column + "]" : "(" + row + ", " + column + ")";
    }

    private boolean comma() {
        skipSpaces();
        if (pos < text.length() && text.charAt(pos) == ',') {
            pos++;
            return true;
        }
        return false;
    }

    private void expect(char c, String what) {
        skipSpaces();
        if (pos >= text.length() || text.charAt(pos) != c) {
            throw error("expected " + what);
        }
        pos++;
    }

    private void end() {
        skipSpaces();
        if (pos < text.length()) {
            throw error("unexpected text after the closing ']'");
        }
    }

    private char peek() {
        skipSpaces();
        return pos < text.length() ? text.charAt(pos) : '\0';
    }

    private int skipSpaces() {
        while (pos < text.length() && Character.isWhitespace(text.charAt(pos))) {
            pos++;
        }
        return pos;
    }

    private InputException error(String message) {
        return new InputException(name + ": " + message, text, Math.min(pos, text.length()));
    }
}
