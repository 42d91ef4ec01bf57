package dev.rootform.cli;

/** The command's exit codes (the contract in the README). */
final class ExitCode {
    /** Solved, and every check held. */
    static final int VERIFIED = 0;
    /** An internal error: a bug or an exhausted budget. */
    static final int INTERNAL = 1;
    /** Bad input or out of scope. */
    static final int BAD_INPUT = 2;
    /** Solved, but a check failed. */
    static final int CHECK_FAILED = 3;
    /** check: the claim fails (the answer explains why). */
    static final int CLAIM_FAILS = 4;

    private ExitCode() {
    }
}
