package eluvia.design;

import java.time.Instant;
import java.util.List;
import java.util.Optional;

import eluvia.site.validation.Problem;

/**
 * Everything one run of the design pipeline produced, for the report writer, the workbench and the
 * command line alike.
 *
 * @param projectName name of the project
 * @param startedAt when the run started
 * @param problems validation warnings (a run with errors does not get this far)
 * @param flushing one result per flushing design
 * @param cautions the cautions that apply to these results
 * @param settings the settings of the run (stated defaults unless set)
 * @param zoneAnalysis the zone above the cleanup level estimated from the samples
 * @param enlargements per entered treatment zone, its enlargement by dispersion against delay
 * @param excavations one take-off per excavation design
 * @param alternatives the alternatives priced, side by side (flushing, excavation, hybrid)
 * @param lowestPresentValue name of the available alternative with the lowest present value, or
 *        null when none is available or they are not comparable (different currencies)
 * @param costOfDelay present value against delay per flushing and excavation alternative
 * @param notes run-wide notes (settings used, comparability)
 */
public record DesignRun(String projectName, Instant startedAt, List<Problem> problems,
        List<FlushingDesignResult> flushing, List<String> cautions, DesignSettings settings, ZoneAnalysis zoneAnalysis,
        List<ZoneEnlargement> enlargements, List<ExcavationResult> excavations, List<AlternativeResult> alternatives,
        String lowestPresentValue, List<CostOfDelayResult> costOfDelay, List<String> notes) {

    /** Copies the lists. */
    public DesignRun {
        problems = List.copyOf(problems);
        flushing = List.copyOf(flushing);
        cautions = List.copyOf(cautions);
        enlargements = List.copyOf(enlargements);
        excavations = List.copyOf(excavations);
        alternatives = List.copyOf(alternatives);
        costOfDelay = List.copyOf(costOfDelay);
        notes = List.copyOf(notes);
    }

    /** The alternative of this name. */
    public Optional<AlternativeResult> alternative(String name) {
        return alternatives.stream().filter(a -> a.name().equals(name)).findFirst();
    }
}
