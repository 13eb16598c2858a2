package eluvia.design;

import java.util.List;

/**
 * The cautions every result, screen and export of Eluvia shows. They defer to local codes and
 * licensed practice: the tool estimates, a licensed engineer decides.
 */
public final class Cautions {

    /** Results are estimates for planning, not a design. */
    public static final String LICENSED_REVIEW =
            "Results are planning estimates. A licensed professional engineer must review, adapt and seal any "
                    + "design based on them, following the codes and regulations where the site is.";

    /** Flushing mobilises contaminants; the water must be captured and treated. */
    public static final String CAPTURE_FLUSHED_WATER =
            "Flushing mobilises contaminants: all flushing water must be captured and treated before discharge. "
                    + "Groundwater protection rules and discharge permits apply; check the capture system for the "
                    + "water that escapes it.";

    /** Excavation safety; the depth threshold follows common occupational safety rules. */
    public static final String EXCAVATION_SAFETY =
            "Excavations deeper than about 1.5 m (5 ft) need a protective system (sloping, benching, shoring or "
                    + "shielding) under most occupational safety rules; allowable side slopes depend on the soil "
                    + "type. Follow the rules where the site is and a competent person's judgement on site.";

    /** Example data is invented. */
    public static final String INVENTED_EXAMPLE =
            "The shipped example project, its site, samples and unit rates are invented for demonstration. "
                    + "Users must enter their own site data and unit rates.";

    private Cautions() {
    }

    /** The cautions that apply to a flushing design, in the order they are shown. */
    public static List<String> forFlushing() {
        return List.of(LICENSED_REVIEW, CAPTURE_FLUSHED_WATER);
    }

    /** All cautions, in the order they are shown at start and in reports. */
    public static List<String> all() {
        return List.of(LICENSED_REVIEW, CAPTURE_FLUSHED_WATER, EXCAVATION_SAFETY, INVENTED_EXAMPLE);
    }
}
