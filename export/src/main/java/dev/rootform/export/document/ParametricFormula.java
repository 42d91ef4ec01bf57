package dev.rootform.export.document;

import dev.rootform.symbolic.model.Domain;
import dev.rootform.symbolic.params.ParamFunction;
import dev.rootform.symbolic.params.ParamMode;
import dev.rootform.symbolic.params.ParamPiece;
import dev.rootform.symbolic.params.ParametricCase;
import dev.rootform.symbolic.params.Regime;
import dev.rootform.symbolic.params.SquareRoot;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * One case of a solution with parameters as plain text: the formula and the definitions of the
 * root symbols it uses (ω1 = …; R1 = …, θ1 = arccos(σ/R1) for a recurrence's complex pair).
 */
final class ParametricFormula {
    /** The formula and its definitions. */
    record Text(String formula, List<String> definitions) { }

    private final Domain domain;
    private final String v;

    ParametricFormula(Domain domain, String variable) {
        this.domain = domain;
        this.v = variable;
    }

    Text of(String function, ParametricCase c) {
        List<String> terms = new ArrayList<>();
        List<String> definitions = new ArrayList<>();
        for (int i = 0; i < c.modes().size(); i++) {
            define(c, i, definitions);
        }
        for (ParamPiece p : c.pieces()) {
            terms.addAll(terms(c, p));
        }
        String head = domain == Domain.DIFFERENTIAL ? function + "(" + v + ")" : function + "[" + v + "]";
        return new Text(head + " = " + sum(terms), definitions);
    }

    private void define(ParametricCase c, int i, List<String> definitions) {
        Optional<SquareRoot> scale = c.scales().get(i);
        if (scale.isEmpty() || scale.get().rational() && !(domain == Domain.DIFFERENCE && c.regimes().get(i) == Regime.COMPLEX_PAIR)) {
            return;
        }
        String root = root(scale.get());
        if (domain == Domain.DIFFERENCE && c.regimes().get(i) == Regime.COMPLEX_PAIR) {
            definitions.add("R" + (i + 1) + " = " + root);
            definitions.add("θ" + (i + 1) + " = arccos(" + factor(c.modes().get(i).centre()) + "/R" + (i + 1) + ")");
        } else {
            definitions.add("ω" + (i + 1) + " = " + root);
        }
    }

    private static String root(SquareRoot s) {
        if (s.rational()) {
            return s.outside().toString();
        }
        String under = "√(" + s.inside() + ")";
        ParamFunction o = s.outside();
        if (o.isConstant() && o.constantValue().isOne()) {
            return under;
        }
        return factor(o) + "·" + under;
    }

    private List<String> terms(ParametricCase c, ParamPiece p) {
        ParamMode m = c.modes().get(p.mode());
        Regime r = c.regimes().get(p.mode());
        int i = p.mode() + 1;
        String growth = growth(m.centre());
        List<String> out = new ArrayList<>();
        String w = c.scales().get(p.mode()).map(s -> s.rational() ? factor(s.outside()) : "ω" + i).orElse("");
        if (domain == Domain.DIFFERENTIAL) {
            switch (r) {
                case ROOT:
                    out.add(product(p.even(), power(p.power()), growth));
                    break;
                case DOUBLE_ROOT:
                    out.add(product(p.even(), power(p.power()), growth));
                    out.add(product(p.odd(), power(p.power() + 1), growth));
                    break;
                default:
                    String[] f = r == Regime.REAL_PAIR ? new String[] {"cosh", "sinh"} : new String[] {"cos", "sin"};
                    out.add(product(p.even(), power(p.power()), growth, f[0] + "(" + w + "·" + v + ")"));
                    out.add(product(p.odd(), power(p.power()), growth, f[1] + "(" + w + "·" + v + ")/" + w));
            }
            return out;
        }
        String sigma = factor(m.centre());
        switch (r) {
            case ROOT:
                boolean one = m.centre().isConstant() && m.centre().constantValue().isOne();
                out.add(product(p.even(), power(p.power()), one ? "" : sigma + "^" + v));
                break;
            case DOUBLE_ROOT:
                out.add(product(p.even(), power(p.power()), sigma + "^" + v));
                out.add(product(p.odd(), power(p.power() + 1), sigma + "^(" + v + " - 1)"));
                break;
            case REAL_PAIR:
                String plus = "(" + m.centre() + " + " + w + ")^" + v;
                String minus = "(" + m.centre() + " - " + w + ")^" + v;
                out.add(product(p.even(), power(p.power()), "(" + plus + " + " + minus + ")/2"));
                out.add(product(p.odd(), power(p.power()), "(" + plus + " - " + minus + ")/(2·" + w + ")"));
                break;
            default:
                out.add(product(p.even(), power(p.power()), "R" + i + "^" + v + "·cos(θ" + i + "·" + v + ")"));
                out.add(product(p.odd(), power(p.power()), "R" + i + "^(" + v + " - 1)·sin(θ" + i + "·" + v + ")/sin(θ" + i + ")"));
        }
        return out;
    }

    private String growth(ParamFunction rate) {
        if (rate.isZero()) {
            return "";
        }
        return "e^(" + factor(rate) + "·" + v + ")";
    }

    private String power(int j) {
        return j == 0 ? "" : j == 1 ? v : v + "^" + j;
    }

    /** c·f1·f2…, with c = 1 and empty factors left out; "" when c is zero. */
    private static String product(ParamFunction c, String... factors) {
        if (c.isZero()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (String f : factors) {
            if (!f.isEmpty()) {
                parts.add(f);
            }
        }
        boolean one = c.isConstant() && c.constantValue().isOne();
        boolean minusOne = c.isConstant() && c.constantValue().negate().isOne();
        if (parts.isEmpty()) {
            return c.toString();
        }
        String body = String.join("·", parts);
        return one ? body : minusOne ? "-" + body : factor(c) + "·" + body;
    }

    /** The text of f, in parentheses when it is a sum or a quotient. */
    static String factor(ParamFunction f) {
        String t = f.toString();
        boolean compound = t.indexOf(" + ") > 0 || t.indexOf(" - ") > 0 || t.contains("/");
        return compound ? "(" + t + ")" : t;
    }

    private static String sum(List<String> terms) {
        StringBuilder s = new StringBuilder();
        for (String t : terms) {
            if (t.isEmpty()) {
                continue;
            }
            if (s.length() == 0) {
                s.append(t);
            } else if (t.startsWith("-")) {
                s.append(" - ").append(t.substring(1));
            } else {
                s.append(" + ").append(t);
            }
        }
        return s.length() == 0 ? "0" : s.toString();
    }
}
