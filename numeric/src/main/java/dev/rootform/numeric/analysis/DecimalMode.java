package dev.rootform.numeric.analysis;

import java.math.BigDecimal;
import java.util.Objects;

/**
 * One mode of a conjugate sum Σ_α c(α)·v^p·e^{αv} (or α^v) in decimals, for the numeric
 * presentation: a real root ρ gives cosine·v^p·e^{ρv} (difference: cosine·v^p·ρ^v, sine 0 and
 * frequency 0); a complex pair σ ± iω gives v^p·e^{σv}·(cosine·cos(ωv) + sine·sin(ωv)) with
 * cosine = 2·Re c(α) and sine = −2·Im c(α) (difference: growth |α| and frequency arg α in (0, π)).
 * Rounded to the analysis digits from certified roots; approximate.
 *
 * @param cosine the coefficient of the real mode or of its cosine
 * @param sine the coefficient of the sine (0 for a real root)
 * @param power p
 * @param growth ρ or σ (differential), ρ or |α| (difference)
 * @param frequency 0 for a real root, ω or arg α otherwise
 * @since 0.2
 */
public record DecimalMode(BigDecimal cosine, BigDecimal sine, int power, BigDecimal growth, BigDecimal frequency) {
    public DecimalMode {
        Objects.requireNonNull(cosine, "cosine");
        Objects.requireNonNull(sine, "sine");
        Objects.requireNonNull(growth, "growth");
        Objects.requireNonNull(frequency, "frequency");
    }

    /** Whether this is the mode of a real root (no oscillation). */
    public boolean real() {
        return frequency.signum() == 0;
    }
}
