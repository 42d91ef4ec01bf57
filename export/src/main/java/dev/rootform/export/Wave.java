package dev.rootform.export;

/**
 * One real term of emitted code, with constants rounded once from their exact values:
 * amplitude·v^power·G(v)·cos(angle + phase), where G(v) = e^{growth·v} (differential) or growth^v
 * (difference), and angle = frequency·v, or for a sequence whose angle per step is exactly
 * 2π·multiplier/modulus, angle = frequency·((n·multiplier) mod modulus) with frequency = 2π/modulus
 * (exact argument reduction in integers: the angle stays below 2π for every n); frequency 0 means
 * the cosine factor is left out.
 *
 * @param modulus M &gt; 0 when the angle per step is 2π·multiplier/M exactly (sequences), else 0
 * @param multiplier K in 0 .. M − 1 (0 when modulus is 0)
 * @param growthError |growth − exact growth| (the rounding of the growth rate or base)
 * @param frequencyError |frequency − exact frequency| (the rounding of the angular frequency)
 * @since 0.2
 */
public record Wave(double amplitude, int power, double growth, double frequency, double phase, long modulus,
        long multiplier, double growthError, double frequencyError) {
    /** The wave that stands for an empty sum. */
    public static final Wave ZERO = new Wave(0.0, 0, 0.0, 0.0, 0.0, 0, 0, 0.0, 0.0);

    public Wave {
        if (modulus < 0 || multiplier < 0 || (modulus == 0 ? multiplier != 0 : multiplier >= modulus)) {
            throw new IllegalArgumentException("multiplier " + multiplier + " must lie in 0.." + modulus + " - 1");
        }
    }

    /** A wave without exact argument reduction. */
    public Wave(double amplitude, int power, double growth, double frequency, double phase, double growthError,
            double frequencyError) {
        this(amplitude, power, growth, frequency, phase, 0, 0, growthError, frequencyError);
    }

    /** Whether the angle is reduced exactly in integers ({@code modulus > 0}). */
    public boolean reduced() {
        return modulus > 0;
    }

    /** (n·multiplier) mod modulus, computed without overflow for any long n (modulus below 2^31). */
    public long reducedStep(long n) {
        return Math.floorMod(Math.floorMod(n, modulus) * multiplier, modulus);
    }
}
