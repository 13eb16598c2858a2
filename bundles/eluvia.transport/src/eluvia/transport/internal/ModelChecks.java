package eluvia.transport.internal;

import eluvia.transport.CleanupCriterion;
import eluvia.transport.TransportInputException;

/** Argument checks shared by the flushing models. */
public final class ModelChecks {
    private ModelChecks() {
    }

    /** Throws unless the criterion is given and the pore volumes are finite and not negative. */
    public static void check(CleanupCriterion criterion, double poreVolumes) {
        if (criterion == null) {
            throw new TransportInputException("cleanup criterion", null, "one of effluent, mean, max");
        }
        TransportInputException.requireNonNegative("pore volumes (-)", poreVolumes);
    }
}
