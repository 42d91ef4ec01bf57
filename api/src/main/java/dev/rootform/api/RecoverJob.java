package dev.rootform.api;

import dev.rootform.symbolic.algebra.Rational;
import dev.rootform.symbolic.model.InputException;
import dev.rootform.symbolic.recover.RecoveredRecurrence;
import dev.rootform.symbolic.recover.Recoverer;
import dev.rootform.symbolic.recover.TermsReader;
import java.util.List;

/** One recovery: read the terms, find the shortest recurrence, and solve its text as {@link Rootform#solve} would. */
final class RecoverJob {
    private RecoverJob() {
    }

    static Recovery run(RecoverRequest request) {
        Result.OutOfTime late = new Result.OutOfTime(request.options().timeLimit());
        return TimeLimit.within(request.options().timeLimit(), () -> recover(request), new Recovery.NotRecovered(late));
    }

    private static Recovery recover(RecoverRequest request) {
        try {
            Points.parse(request.options().points());
            List<Rational> terms = TermsReader.read(request.terms());
            RecoveredRecurrence recurrence = Recoverer.recover(terms, request.start());
            if (!recurrence.confirmed()) {
                return new Recovery.TooFewTerms(terms.size(), recurrence.order(), recurrence.termsNeeded());
            }
            return new Recovery.Recovered(recurrence, Rootform.solve(SolveRequest.of(recurrence.text()).with(request.options())));
        } catch (InputException e) {
            return new Recovery.NotRecovered(SolveJob.refused(e));
        }
    }
}
