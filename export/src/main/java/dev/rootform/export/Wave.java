package dev.rootform.export;

/**
 * One real term of emitted code, with constants rounded once from their exact values:
 * amplitude·v^power·G(v)·cos(frequency·v + phase), where G(v) = e^{growth·v} (differential) or
 * growth^v (difference); frequency 0 means the cosine factor is left out.
 *
 * @since 0.2
 */
public record Wave(double amplitude, int power, double growth, double frequency, double phase) {
    /** The wave that stands for an empty sum. */
    public static final Wave ZERO = new Wave(0.0, 0, 0.0, 0.0, 0.0);
}
