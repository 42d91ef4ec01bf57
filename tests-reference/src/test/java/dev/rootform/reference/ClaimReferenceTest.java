package dev.rootform.reference;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import dev.rootform.api.CheckRequest;
import dev.rootform.api.CheckResult;
import dev.rootform.api.Rootform;
import dev.rootform.export.document.ClaimReport;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvFileSource;

/**
 * Closed forms as books and references print them ({@code claims.csv}, sources per row), checked
 * through the library API: the verdict and whether it was decided exactly.
 */
class ClaimReferenceTest {
    @ParameterizedTest(name = "{0}")
    @CsvFileSource(resources = "/reference/claims.csv", delimiter = '|')
    void publishedClaimsGetTheirVerdict(String source, String problem, String claim, String verdict, boolean exact) {
        CheckResult r = Rootform.check(CheckRequest.of(problem, claim));
        ClaimReport report = r.report().orElseGet(() -> fail(source + ": not checked: " + r));
        assertEquals(verdict, report.holds() ? "holds" : "fails", source + ": " + report);
        assertEquals(exact, report.exact(), source + ": " + report.notes());
    }
}
