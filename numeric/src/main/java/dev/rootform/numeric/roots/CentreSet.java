package dev.rootform.numeric.roots;

import java.math.BigDecimal;

/**
 * Exact decimal centres z_k = re[k] + i·im[k] that are closed under complex conjugation:
 * z_{partner[k]} = conj(z_k), with partner[k] = k exactly when im[k] = 0.
 */
record CentreSet(BigDecimal[] re, BigDecimal[] im, int[] partner) {
    int size() {
        return re.length;
    }
}
