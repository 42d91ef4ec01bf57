package dev.rootform.export.code;

import dev.rootform.export.CodeModel;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.export.Wave;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import java.math.MathContext;
import java.util.List;
import java.util.Optional;

/**
 * Builds the {@link CodeModel} of a fitted answer: the closed form with every constant rounded once
 * to double ({@link WaveBuilder}), for a differential equation its Taylor series at t0
 * ({@link TaylorSeries}), its valid range and its measured accuracy in each C variant
 * ({@link CodeMeasurement}), and for an integer-valued recurrence the reach of its exact 64-bit term
 * ({@link ExactTerms}).
 *
 * @since 0.2
 */
public final class CodeModels {
    private static final MathContext ROUNDING = new MathContext(25);

    private CodeModels() {
    }

    /**
     * @throws IllegalArgumentException if {@link CodeRequests#fitted} refuses the report (free
     *     constants, or no fitted solution)
     */
    public static CodeModel of(Report r) {
        CodeRequests.require(CodeRequests.fitted(r));
        ClosedForm f = CodeHeader.codeForm(r);
        boolean sequence = f.domain() == Domain.DIFFERENCE;
        long first = sequence ? f.origin().toBigInteger().longValueExact() : 0;
        List<Wave> waves = WaveBuilder.of(f);
        Optional<TaylorSeries.Series> series = sequence ? Optional.empty() : TaylorSeries.of(f, r.solution().exact(), waves);
        NumericForm form = new NumericForm(f.domain(), sequence ? first : f.origin().toBigDecimal(ROUNDING).doubleValue(), first,
                sequence ? f.validFrom() : 0, f.leadingValues().stream().map(q -> q.toBigDecimal(ROUNDING).doubleValue()).toList(),
                waves, series.map(TaylorSeries.Series::coefficients).orElse(List.of()),
                series.map(TaylorSeries.Series::radius).orElse(0.0));
        return new CodeModel(form, CodeMeasurement.measure(r.solution(), form, f.origin()),
                r.solution().exact().flatMap(IntegerRecurrence::of).flatMap(ExactTerms::of));
    }
}
