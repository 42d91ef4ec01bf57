package dev.rootform.export.code;

import dev.rootform.export.CodeModel;
import dev.rootform.export.NumericForm;
import dev.rootform.export.Report;
import dev.rootform.symbolic.closedform.ClosedForm;
import dev.rootform.symbolic.model.Domain;
import java.math.MathContext;

/**
 * Builds the {@link CodeModel} of a fitted answer: the closed form with every constant rounded once
 * to double ({@link WaveBuilder}), its valid range and its measured accuracy in each C variant
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
        NumericForm form = new NumericForm(f.domain(), sequence ? first : f.origin().toBigDecimal(ROUNDING).doubleValue(), first,
                sequence ? f.validFrom() : 0, f.leadingValues().stream().map(q -> q.toBigDecimal(ROUNDING).doubleValue()).toList(),
                WaveBuilder.of(f));
        return new CodeModel(form, CodeMeasurement.measure(r.solution(), form),
                r.solution().exact().flatMap(IntegerRecurrence::of).flatMap(ExactTerms::of));
    }
}
