package dev.rootform.numeric.plot;

/**
 * One point of a plotted curve, in double precision (approximate; enough for a picture).
 *
 * @param x the abscissa: t, n, or a frequency
 * @param y the ordinate
 * @since 0.3
 */
public record Sample(double x, double y) {
}
