package dev.rootform.numeric.params;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.params.ParamMode;
import dev.rootform.symbolic.params.ParamPiece;
import dev.rootform.symbolic.params.ParametricCase;
import java.util.Map;

/**
 * Values of one case of a solution with parameters at rational parameter values: exact for a
 * recurrence (X_E, X_O by their recurrences in Q), in double precision for a differential equation
 * (X_E = e^(σt)·cosh(√W t) or cos(√(−W) t), X_O = e^(σt)·sinh(√W t)/√W or sin(√(−W) t)/√(−W), W = 0:
 * e^(σt) and t·e^(σt), with W exact at the point).
 *
 * @since 0.3
 */
public final class CaseValues {
    private CaseValues() {
    }

    /**
     * x[n] of the case at the parameter values.
     *
     * @throws IllegalArgumentException for a general solution (free constants) or a value missing
     */
    public static Rational sequenceValue(ParametricCase c, Map<String, Rational> at, int n) {
        requireFitted(c);
        Rational sum = Rational.ZERO;
        for (ParamPiece p : c.pieces()) {
            ParamMode m = c.modes().get(p.mode());
            Rational centre = m.centre().evaluate(at);
            Rational square = m.square().evaluate(at);
            Rational even = Rational.ONE;
            Rational odd = Rational.ZERO;
            for (int k = 0; k < n; k++) {
                Rational e = centre.multiply(even).add(square.multiply(odd));
                odd = even.add(centre.multiply(odd));
                even = e;
            }
            Rational x = p.even().evaluate(at).multiply(even).add(p.odd().evaluate(at).multiply(odd));
            sum = sum.add(x.multiply(Rational.of(n).pow(p.power())));
        }
        return sum;
    }

    /**
     * y(t) of the case at the parameter values, in double precision.
     *
     * @throws IllegalArgumentException for a general solution (free constants) or a value missing
     */
    public static double functionValue(ParametricCase c, Map<String, Rational> at, double t) {
        requireFitted(c);
        double sum = 0;
        for (ParamPiece p : c.pieces()) {
            ParamMode m = c.modes().get(p.mode());
            double growth = Math.exp(m.centre().evaluate(at).doubleValue() * t);
            double square = m.square().evaluate(at).doubleValue();
            double even;
            double odd;
            if (square > 0) {
                double w = Math.sqrt(square);
                even = Math.cosh(w * t);
                odd = Math.sinh(w * t) / w;
            } else if (square < 0) {
                double w = Math.sqrt(-square);
                even = Math.cos(w * t);
                odd = Math.sin(w * t) / w;
            } else {
                even = 1;
                odd = t;
            }
            double x = p.even().evaluate(at).doubleValue() * even + p.odd().evaluate(at).doubleValue() * (m.pair() ? odd : 0);
            sum += x * growth * Math.pow(t, p.power());
        }
        return sum;
    }

    private static void requireFitted(ParametricCase c) {
        if (!c.freeConstants().isEmpty()) {
            throw new IllegalArgumentException("a general solution (free constants " + c.freeConstants() + ") has no values");
        }
    }
}
