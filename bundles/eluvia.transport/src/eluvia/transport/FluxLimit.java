package eluvia.transport;

/**
 * Check of a flushing rate against the soil's saturated hydraulic conductivity.
 *
 * <p>Water applied at the surface and draining under gravity alone (unit hydraulic gradient)
 * moves at a Darcy flux equal to the hydraulic conductivity at the prevailing water content,
 * which is at most the saturated conductivity Ks (Darcy's law with a unit gradient; Buckingham
 * 1907 and Richards 1931 for unsaturated flow). A design flux above Ks cannot infiltrate at
 * unit gradient: the water ponds or runs off unless it is driven by pressure (injection wells,
 * ponding head). A flux above {@value #NEAR_FRACTION} Ks (a margin of our own choosing, not a
 * published value) is flagged as near the limit: the layer is then close to saturation and the
 * water content theta approaches the porosity. Both quantities in m/day (1 cm/s = 864 m/day).
 */
public final class FluxLimit {
    /** Fraction of Ks above which a flux is reported as near the limit. */
    public static final double NEAR_FRACTION = 0.8;

    /** Outcome of the check. */
    public enum Status {
        /** The flux is below {@value FluxLimit#NEAR_FRACTION} Ks. */
        WITHIN,
        /** The flux is between {@value FluxLimit#NEAR_FRACTION} Ks and Ks. */
        NEAR_LIMIT,
        /** The flux exceeds Ks: not possible under unit-gradient infiltration. */
        EXCEEDS
    }

    /**
     * The result of a check.
     *
     * @param darcyFluxMetresPerDay design Darcy flux q, m/day
     * @param saturatedConductivityMetresPerDay saturated hydraulic conductivity Ks, m/day
     * @param fluxOverConductivity q / Ks, dimensionless
     * @param status within, near the limit or exceeding it
     * @param message plain words with the numbers
     */
    public record Check(double darcyFluxMetresPerDay, double saturatedConductivityMetresPerDay,
            double fluxOverConductivity, Status status, String message) {
    }

    private FluxLimit() {
    }

    /**
     * Checks a design flux against Ks and says how it compares.
     *
     * @param darcyFluxMetresPerDay design Darcy flux, m/day, greater than 0
     * @param saturatedConductivityMetresPerDay saturated hydraulic conductivity, m/day, greater than 0
     */
    public static Check check(double darcyFluxMetresPerDay, double saturatedConductivityMetresPerDay) {
        TransportInputException.requirePositive("Darcy flux (m/day)", darcyFluxMetresPerDay);
        TransportInputException.requirePositive("saturated hydraulic conductivity (m/day)",
                saturatedConductivityMetresPerDay);
        double ratio = darcyFluxMetresPerDay / saturatedConductivityMetresPerDay;
        String numbers = String.format(java.util.Locale.ROOT, "Darcy flux %.4g m/day is %.3g times Ks = %.4g m/day",
                darcyFluxMetresPerDay, ratio, saturatedConductivityMetresPerDay);
        if (ratio > 1) {
            return new Check(darcyFluxMetresPerDay, saturatedConductivityMetresPerDay, ratio, Status.EXCEEDS, numbers
                    + ": more than unit-gradient infiltration can carry; lower the flux to at most Ks or drive it by"
                    + " pressure (injection, ponding) and check the water content used");
        }
        if (ratio > NEAR_FRACTION) {
            return new Check(darcyFluxMetresPerDay, saturatedConductivityMetresPerDay, ratio, Status.NEAR_LIMIT, numbers
                    + ": near saturation, so the water content is close to the porosity; allow for ponding");
        }
        return new Check(darcyFluxMetresPerDay, saturatedConductivityMetresPerDay, ratio, Status.WITHIN,
                numbers + ": within the unit-gradient limit");
    }

    /**
     * Refuses a flux above Ks.
     *
     * @throws TransportInputException naming the flux, its value and the limit when q &gt; Ks
     */
    public static Check require(double darcyFluxMetresPerDay, double saturatedConductivityMetresPerDay) {
        Check c = check(darcyFluxMetresPerDay, saturatedConductivityMetresPerDay);
        if (c.status() == Status.EXCEEDS) {
            throw new TransportInputException("Darcy flux (m/day)", darcyFluxMetresPerDay,
                    "at most the saturated hydraulic conductivity " + saturatedConductivityMetresPerDay
                            + " m/day under unit-gradient infiltration (" + c.message() + ")");
        }
        return c;
    }
}
