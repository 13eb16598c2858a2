package eluvia.app.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

import eluvia.transport.TransportInputException;
import eluvia.transport.numerical.SoilLayer;
import eluvia.transport.numerical.SorptionIsotherm;

/**
 * Reads a layered profile for {@code flush --model numerical --layers FILE}: one row per layer,
 * top to bottom, with a header row. Columns (units in the names):
 * {@code thickness_m, water_content, porosity, bulk_density_kg_m3, dispersivity_m} and one
 * isotherm: {@code kd_l_kg}, or {@code freundlich_kf} with {@code freundlich_n}, or
 * {@code langmuir_smax_mg_kg} with {@code langmuir_k_l_mg}; optional two-region columns
 * {@code mobile_water_fraction, mobile_site_fraction, mass_transfer_per_day}.
 */
final class LayersCsv {

    static final List<String> REQUIRED = List.of("thickness_m", "water_content", "porosity", "bulk_density_kg_m3",
            "dispersivity_m");

    private LayersCsv() {
    }

    static List<SoilLayer> read(Path file, double diffusionSquareMetresPerSecond, double decayPerDay) {
        if (!Files.isRegularFile(file)) {
            throw new OptionCheck("--layers", file, "an existing CSV file");
        }
        List<SoilLayer> layers = new ArrayList<>();
        CSVFormat format = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setTrim(true)
                .setIgnoreEmptyLines(true).setCommentMarker('#').get();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8); CSVParser p = CSVParser.parse(in, format)) {
            Map<String, Integer> header = p.getHeaderMap();
            for (String col : REQUIRED) {
                if (!header.containsKey(col)) {
                    throw new OptionCheck("--layers", file.getFileName() + " has no column " + col,
                            "a header row with " + String.join(", ", REQUIRED) + " and an isotherm (kd_l_kg, freundlich_kf + freundlich_n, or langmuir_smax_mg_kg + langmuir_k_l_mg)");
                }
            }
            for (CSVRecord r : p) {
                layers.add(layer(file, r, header, diffusionSquareMetresPerSecond, decayPerDay));
            }
        } catch (IOException | java.io.UncheckedIOException e) {
            throw new OptionCheck("--layers", file, "a readable CSV file (" + e.getMessage() + ")");
        }
        if (layers.isEmpty()) {
            throw new OptionCheck("--layers", file.getFileName() + " has no layer rows", "at least one row under the header");
        }
        return layers;
    }

    private static SoilLayer layer(Path file, CSVRecord r, Map<String, Integer> header, double diffusion, double decay) {
        String where = file.getFileName() + " line " + (r.getRecordNumber() + 1);
        try {
            SoilLayer.Builder b = SoilLayer.builder().thicknessMetres(number(r, "thickness_m", where))
                    .waterContent(number(r, "water_content", where)).porosity(number(r, "porosity", where))
                    .bulkDensityKilogramsPerCubicMetre(number(r, "bulk_density_kg_m3", where))
                    .dispersivityMetres(number(r, "dispersivity_m", where))
                    .freeWaterDiffusionSquareMetresPerSecond(diffusion).decayInWaterPerDay(decay).decayOnSolidsPerDay(decay);
            if (has(r, header, "freundlich_kf")) {
                b.isotherm(SorptionIsotherm.freundlich(number(r, "freundlich_kf", where), number(r, "freundlich_n", where)));
            } else if (has(r, header, "langmuir_smax_mg_kg")) {
                b.isotherm(SorptionIsotherm.langmuir(number(r, "langmuir_smax_mg_kg", where), number(r, "langmuir_k_l_mg", where)));
            } else {
                b.isotherm(SorptionIsotherm.linear(number(r, "kd_l_kg", where)));
            }
            if (has(r, header, "mobile_water_fraction")) {
                b.mobileWaterFraction(number(r, "mobile_water_fraction", where))
                        .mobileSorbingSiteFraction(number(r, "mobile_site_fraction", where))
                        .massTransferRatePerDay(number(r, "mass_transfer_per_day", where));
            }
            return b.build();
        } catch (TransportInputException e) {
            throw new OptionCheck("--layers", where + ": " + e.quantity() + " = " + e.value(), e.allowedRange());
        }
    }

    private static boolean has(CSVRecord r, Map<String, Integer> header, String col) {
        return header.containsKey(col) && r.isSet(col) && !r.get(col).isEmpty();
    }

    private static double number(CSVRecord r, String col, String where) {
        if (!r.isMapped(col) || !r.isSet(col) || r.get(col).isEmpty()) {
            throw new OptionCheck("--layers", where + ": column " + col + " is empty or missing", "a number in every row");
        }
        try {
            return Double.parseDouble(r.get(col).toLowerCase(Locale.ROOT));
        } catch (NumberFormatException e) {
            throw new OptionCheck("--layers", where + ": " + col + " = '" + r.get(col) + "'", "a number");
        }
    }
}
