package dev.rootform.api.batch;

import java.time.Duration;
import java.util.function.Supplier;

/**
 * One entry of the command table: reads a request's fields into an API call, without running it
 * yet, so that unknown fields are refused before any work.
 */
@FunctionalInterface
interface Command {
    /**
     * @param defaultTimeLimit the time limit when the request sets none
     * @return the API call, which gives the command's JSON answer or why there is none
     * @throws dev.rootform.symbolic.model.InputException for a missing, mistyped or invalid field
     */
    Supplier<Reply> prepare(Fields fields, Duration defaultTimeLimit);
}
