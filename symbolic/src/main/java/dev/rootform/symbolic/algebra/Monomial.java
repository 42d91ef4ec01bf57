package dev.rootform.symbolic.algebra;

import java.util.Arrays;

/**
 * A power product x_0^e_0 · … · x_{k-1}^e_{k-1} of the parameters (and possibly the root variable λ,
 * the last index), as an exponent vector. Immutable; ordered by total degree, then lexicographically.
 */
final class Monomial implements Comparable<Monomial> {
    private final int[] exponents;
    private final int degree;
    private final int hash;

    Monomial(int[] exponents) {
        this.exponents = exponents.clone();
        int sum = 0;
        for (int e : exponents) {
            sum += e;
        }
        this.degree = sum;
        this.hash = Arrays.hashCode(exponents);
    }

    static Monomial one(int variables) {
        return new Monomial(new int[variables]);
    }

    static Monomial variable(int variables, int index) {
        int[] e = new int[variables];
        e[index] = 1;
        return new Monomial(e);
    }

    int size() {
        return exponents.length;
    }

    int exponent(int index) {
        return exponents[index];
    }

    int degree() {
        return degree;
    }

    Monomial times(Monomial other) {
        int[] e = exponents.clone();
        for (int i = 0; i < e.length; i++) {
            e[i] += other.exponents[i];
        }
        return new Monomial(e);
    }

    /** This monomial with the exponent of {@code index} set to {@code value}. */
    Monomial with(int index, int value) {
        int[] e = exponents.clone();
        e[index] = value;
        return new Monomial(e);
    }

    int[] exponents() {
        return exponents.clone();
    }

    @Override
    public int compareTo(Monomial other) {
        int byDegree = Integer.compare(other.degree, degree);
        return byDegree != 0 ? byDegree : -Arrays.compare(exponents, other.exponents);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Monomial m && Arrays.equals(exponents, m.exponents);
    }

    @Override
    public int hashCode() {
        return hash;
    }
}
