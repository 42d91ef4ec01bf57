package dev.rootform.symbolic.params;

import java.util.ArrayList;
import java.util.List;

/**
 * E_k = ((σ+x)^k + (σ−x)^k)/2 and O_k = ((σ+x)^k − (σ−x)^k)/(2x) with x² = W, exactly in Q(params):
 * E_0 = 1, O_0 = 0, E_{k+1} = σ·E_k + W·O_k, O_{k+1} = E_k + σ·O_k. They are the k-th derivatives at
 * 0 of X_E, X_O (differential) and their values at n = k (difference); for W = −w² and σ = r they are
 * the derivatives of e^(rt)·cos(wt) and e^(rt)·sin(wt)/w.
 */
final class PairPowers {
    private final List<ParamFunction> even = new ArrayList<>();
    private final List<ParamFunction> odd = new ArrayList<>();
    private final ParamFunction centre;
    private final ParamFunction square;

    PairPowers(ParamFunction centre, ParamFunction square) {
        this.centre = centre;
        this.square = square;
        even.add(ParamFunction.one(centre.names()));
        odd.add(ParamFunction.zero(centre.names()));
    }

    ParamFunction even(int k) {
        extend(k);
        return even.get(k);
    }

    ParamFunction odd(int k) {
        extend(k);
        return odd.get(k);
    }

    private void extend(int k) {
        while (even.size() <= k) {
            ParamFunction e = even.get(even.size() - 1);
            ParamFunction o = odd.get(odd.size() - 1);
            even.add(centre.multiply(e).add(square.multiply(o)));
            odd.add(e.add(centre.multiply(o)));
        }
    }
}
