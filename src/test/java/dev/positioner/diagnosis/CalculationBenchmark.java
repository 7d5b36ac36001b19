package dev.positioner.diagnosis;

import dev.positioner.diagnosis.facts.Reading;
import java.util.List;
import java.util.Map;

/**
 * Benchmark, not a test: how many full sets of engineering findings (bands from design data plus
 * every reading-dependent calculation) one core computes per second, and how many complete
 * in-process diagnoses (rules, Bayes, planner) per second, on the demo valve PV-2041.
 * Run: java -cp target/classes:target/test-classes:$(cat cp.txt) dev.positioner.diagnosis.CalculationBenchmark
 */
public final class CalculationBenchmark {

    public static void main(String[] args) {
        AssetSpec asset = new AssetSpec("PV-2041", null, "VG46", "16/14/11", Map.of(
                "supply_pressure_nominal", 1.7237e6, "piston_bore", 0.2032, "rod_diameter", 0.04445,
                "stroke_length", 0.1016, "pump_rated_flow", 1.2618e-4, "required_thrust", 40034.0,
                "drain_line_length", 6.0, "drain_line_bore", 0.0127, "moving_mass", 180.0));
        Map<String, Reading> readings = Map.of(
                "oil_temperature", new Reading("oil_temperature", 12, "degC", 12, "degC"),
                "supply_pressure", new Reading("supply_pressure", 1.41e6, "Pa", 205, "psi"),
                "drain_pressure", new Reading("drain_pressure", 2.0e5, "Pa", 2, "bar"),
                "particle_count_4um", new Reading("particle_count_4um", 4000, "per_mL", 4000, "per_mL"),
                "particle_count_6um", new Reading("particle_count_6um", 1000, "per_mL", 1000, "per_mL"),
                "particle_count_14um", new Reading("particle_count_14um", 150, "per_mL", 150, "per_mL"),
                "creep_rate", new Reading("creep_rate", 1.6e-5, "m_per_s", 1, "mm_per_min"),
                "pump_flow", new Reading("pump_flow", 1.0e-4, "m3_per_s", 6, "L_per_min"),
                "oscillation_period", new Reading("oscillation_period", 4, "s", 4, "s"));
        long sink = 0;
        for (int i = 0; i < 20_000; i++) {
            sink += NormalBands.facts(asset).size() + EngineeringFindings.facts(asset, readings).size();
        }
        int n = 200_000;
        long t0 = System.nanoTime();
        for (int i = 0; i < n; i++) {
            sink += NormalBands.facts(asset).size() + EngineeringFindings.facts(asset, readings).size();
        }
        double seconds = (System.nanoTime() - t0) / 1e9;
        System.out.printf("full finding sets: %.0f per second (%d facts each, %d sets in %.2f s)%n",
                n / seconds, NormalBands.facts(asset).size() + EngineeringFindings.facts(asset, readings).size(), n, seconds);

        DiagnosisService service = Standalone.service();
        DiagnosisRequest request = new DiagnosisRequest(List.of("slow_stroke", "drain_backpressure"), List.of("external_leak"),
                List.of(new DiagnosisRequest.MeasurementInput("supply_pressure", 205.0, "psi"),
                        new DiagnosisRequest.MeasurementInput("oil_temperature", 54.0, "degF"),
                        new DiagnosisRequest.MeasurementInput("drain_pressure", 2.0, "bar")),
                List.of(new DiagnosisRequest.CheckInput("read_filter_dp", "normal")), List.of("pump_flow_test"),
                new DiagnosisRequest.AssetInput("PV-2041", null, null, null));
        for (int i = 0; i < 2_000; i++) {
            sink += service.diagnose(request).hypotheses().size();
        }
        int m = 5_000;
        t0 = System.nanoTime();
        for (int i = 0; i < m; i++) {
            sink += service.diagnose(request).hypotheses().size();
        }
        seconds = (System.nanoTime() - t0) / 1e9;
        System.out.printf("in-process diagnoses: %.0f per second, %.2f ms each (one thread)%n", m / seconds, seconds * 1000 / m);
        System.out.println("(checksum " + sink + ")");
    }
}
