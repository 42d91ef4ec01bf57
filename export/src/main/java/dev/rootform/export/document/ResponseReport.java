package dev.rootform.export.document;

import dev.rootform.export.Report;
import dev.rootform.numeric.roots.RootApproximation;
import dev.rootform.numeric.response.FrequencyPoint;
import dev.rootform.numeric.response.StepFigures;
import dev.rootform.symbolic.response.ResponsePlan;
import dev.rootform.symbolic.response.TransferFacts;
import dev.rootform.symbolic.transfer.TransferFunction;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything a response answer shows: the transfer function and its exact facts, the response
 * to the input as the solved initial-value problem (a solve {@link Report}, whose closed form,
 * checks, diagnostics and values are the response's), its impulses, the equivalent relations in
 * solve's syntax, and the frequency response and step figures. Renderers only format it.
 *
 * @param source the transfer function as the user wrote it
 * @param transfer the transfer function in lowest terms
 * @param facts poles, zeros, DC gain, properness, stability, hidden modes
 * @param poleValues the poles' values, in the order of {@code facts.poleRoots()}
 * @param zeroValues the zeros' values, in the order of {@code facts.zeroRoots()}
 * @param plan how the response was obtained (output transform, impulses, split)
 * @param response the solved initial-value problem; its checks include the inverse-transform check, its
 *     values are the response's at the requested points
 * @param relation den(L) y = num(L) u in solve's syntax
 * @param problem the solved problem in solve's syntax
 * @param frequencyResponse at the requested frequencies
 * @param stepFigures for a step input to a stable system
 * @param warnings hidden modes and other cautions
 * @since 0.3
 */
public record ResponseReport(String source, TransferFunction transfer, TransferFacts facts, List<RootApproximation> poleValues,
        List<RootApproximation> zeroValues, ResponsePlan plan, Report response, String relation, String problem,
        List<FrequencyPoint> frequencyResponse, Optional<StepFigures> stepFigures, List<String> warnings) {
    public ResponseReport {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(transfer, "transfer");
        Objects.requireNonNull(facts, "facts");
        poleValues = List.copyOf(poleValues);
        zeroValues = List.copyOf(zeroValues);
        Objects.requireNonNull(plan, "plan");
        Objects.requireNonNull(response, "response");
        Objects.requireNonNull(relation, "relation");
        Objects.requireNonNull(problem, "problem");
        frequencyResponse = List.copyOf(frequencyResponse);
        Objects.requireNonNull(stepFigures, "stepFigures");
        warnings = List.copyOf(warnings);
    }

    /** Significant digits of the numeric parts. */
    public int digits() {
        return response.digits();
    }

    /** True when every check held (the solve report's, which include the inverse-transform check). */
    public boolean verified() {
        return response.verified();
    }
}
