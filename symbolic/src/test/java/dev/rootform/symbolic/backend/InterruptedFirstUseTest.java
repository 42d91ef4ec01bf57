package dev.rootform.symbolic.backend;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.rootform.symbolic.algebra.RationalPolynomial;
import org.junit.jupiter.api.Test;

/** A job interrupted at its first use of the factoriser (a time limit) must not break it for later jobs. */
class InterruptedFirstUseTest {
    @Test
    void factoringWorksAfterAnInterruptedCall() throws InterruptedException {
        Thread job = new Thread(() -> {
            Thread.currentThread().interrupt();
            try {
                JasFactorizer.factor(RationalPolynomial.ofIntegers(-3, 0, 1));
            } catch (RuntimeException e) {
                // the interrupted job may be refused (JAS's PreemptingException); what matters is the next call
            }
        });
        job.start();
        job.join();
        // x^2 - 2 is irreducible over Q (√2 is irrational): one factor of multiplicity 1
        assertEquals(1, JasFactorizer.factor(RationalPolynomial.ofIntegers(-2, 0, 1)).size());
    }
}
