package dev.rootform.architecture;

import com.tngtech.archunit.library.freeze.ViolationLineMatcher;

/**
 * Matches a frozen cycle by the slices it passes through ({@code Cycle detected: Slice a -> Slice b
 * -> Slice a}), not by the dependencies listed under it, so that a change inside the classes of a
 * frozen cycle does not make it look new, while any other cycle still does.
 */
final class SameCycle implements ViolationLineMatcher {
    private static final String DETAILS = "\n  1. ";

    @Override
    public boolean matches(String lineFromFirstViolation, String lineFromSecondViolation) {
        return slices(lineFromFirstViolation).equals(slices(lineFromSecondViolation));
    }

    private static String slices(String violation) {
        int details = violation.indexOf(DETAILS);
        return (details < 0 ? violation : violation.substring(0, details)).replaceAll("\\s+", " ").trim();
    }
}
