package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import dev.positioner.diagnosis.facts.Band;
import java.util.Map;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The slow-stroke limit on a stated design stroke time: +25 % over 10 s, +50 % up to 10 s (ASME OM
 * Code, Subsection ISTC, stroke-time acceptance limits as recalled; worked by hand below); without
 * a design time, 1.5 x the swept volume over the rated pump flow.
 */
class StrokeTimeBandTest {

    static double limit(Map<String, Double> design) {
        return NormalBands.facts(new AssetSpec("T", null, "VG46", null, design)).stream()
                .filter(f -> f instanceof Band b && b.quantity().equals("stroke_time_open"))
                .mapToDouble(f -> ((Band) f).high()).findFirst().orElseThrow();
    }

    @ParameterizedTest(name = "design {0} s -> slow beyond {1} s")
    @CsvSource({
            "40, 50",   // 40 x 1.25
            "12, 15",   // 12 x 1.25
            "10, 15",   // 10 s is not over 10 s: 10 x 1.5
            "8, 12"})   // 8 x 1.5
    void designStrokeTimeLimit(double design, double expected) {
        assertEquals(expected, limit(Map.of("design_stroke_time", design)), 1e-9);
    }

    @org.junit.jupiter.api.Test
    void withoutADesignTimeTheIdealFillTimeTimesOneAndAHalf() {
        // bore 0.1 m, stroke 0.1 m: swept volume pi/4 x 0.1^2 x 0.1 = 7.854e-4 m3; at 1e-4 m3/s (6 L/min)
        // the pump fills it in 7.854 s; 1.5 x 7.854 = 11.78 s.
        double limit = limit(Map.of("piston_bore", 0.1, "stroke_length", 0.1, "pump_rated_flow", 1e-4));
        assertEquals(1.5 * Math.PI / 4 * 0.01 * 0.1 / 1e-4, limit, 1e-6);
    }
}
