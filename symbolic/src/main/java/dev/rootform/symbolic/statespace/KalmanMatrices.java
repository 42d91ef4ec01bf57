package dev.rootform.symbolic.statespace;

import dev.rootform.symbolic.matrix.RationalMatrix;

/**
 * The controllability matrix [B AB … A^(n−1)B] and the observability matrix [C; CA; …; CA^(n−1)]
 * of a model; the model is controllable (observable) when its rank is n (Kalman's rank test,
 * common practice).
 *
 * @since 0.3
 */
public final class KalmanMatrices {
    private KalmanMatrices() {
    }

    public static RationalMatrix controllability(StateModel model) {
        RationalMatrix block = model.b();
        RationalMatrix result = block;
        for (int k = 1; k < model.states(); k++) {
            block = model.a().multiply(block);
            result = result.beside(block);
        }
        return result;
    }

    public static RationalMatrix observability(StateModel model) {
        RationalMatrix block = model.c();
        RationalMatrix result = block;
        for (int k = 1; k < model.states(); k++) {
            block = block.multiply(model.a());
            result = result.above(block);
        }
        return result;
    }
}
