package dev.positioner.learning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.positioner.diagnosis.SymptomRates;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import dev.positioner.knowledge.KnowledgeBaseLoader;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;

class BetaRatesTest {

    static final Catalogue CATALOGUE = KnowledgeBaseLoader.load(Path.of("rules")).catalogue();

    @Test
    void jobsMoveTheCatalogueValueByTheirShare() {
        // (10 * 0.45 + 8) / (10 + 10) = 12.5 / 20 = 0.625, worked by hand.
        assertEquals(0.625, BetaRates.update(0.45, 8, 10, 10), 1e-12);
        // No job reported it present: (10 * 0.45 + 0) / 20 = 0.225, halved but not zero.
        assertEquals(0.225, BetaRates.update(0.45, 0, 10, 10), 1e-12);
        assertEquals(0.45, BetaRates.update(0.45, 0, 0, 10), 1e-12);
        double many = BetaRates.update(0.45, 990, 1000, 10);
        assertTrue(many > 0.98 && many < 1, "a thousand jobs take over but never reach certainty: " + many);
    }

    @Test
    void refusesNonsense() {
        assertThrows(IllegalArgumentException.class, () -> BetaRates.update(0.45, 3, 2, 10));
        assertThrows(IllegalArgumentException.class, () -> BetaRates.update(0.45, 1, 2, 0));
        assertThrows(IllegalArgumentException.class, () -> BetaRates.update(1.0, 1, 2, 10));
    }

    @Test
    void onlyTheSymptomsAndCausesTheJobsReportedOnMove() {
        LearntSymptomRates.Counts counts = new LearntSymptomRates.Counts();
        for (int i = 0; i < 3; i++) {
            counts.addJob("pump_worn", List.of("slow_stroke"), List.of("noisy_pump"));
        }
        SymptomRates rates = LearntSymptomRates.rates(CATALOGUE, counts, 10, "in this test");
        List<Fault> h = CATALOGUE.hypotheses();
        int pump = indexOf(h, "pump_worn");
        int filter = indexOf(h, "supply_filter_clogged");
        double slowPump = CATALOGUE.symptoms().get("slow_stroke").present("pump_worn");
        double noisyPump = CATALOGUE.symptoms().get("noisy_pump").present("pump_worn");
        assertEquals((10 * slowPump + 3) / 13, rates.present("slow_stroke", pump), 1e-12);
        assertEquals((10 * noisyPump + 0) / 13, rates.present("noisy_pump", pump), 1e-12);
        // A cause no job confirmed, a symptom no job mentioned, and the unlisted cause keep the catalogue's.
        assertEquals(CATALOGUE.symptoms().get("slow_stroke").present("supply_filter_clogged"), rates.present("slow_stroke", filter), 1e-12);
        assertEquals(CATALOGUE.symptoms().get("hunting").present("pump_worn"), rates.present("hunting", pump), 1e-12);
        assertEquals(CATALOGUE.unlistedSymptomPresent(), rates.present("slow_stroke", h.size() - 1), 1e-12);
        assertTrue(rates.basis().contains("3 closed job(s) in this test"), rates.basis());
        assertNull(LearntSymptomRates.rates(CATALOGUE, new LearntSymptomRates.Counts(), 10, "nowhere").basis(),
                "without jobs the catalogue's own values, and nothing to say about them");
    }

    private static int indexOf(List<Fault> hypotheses, String code) {
        for (int i = 0; i < hypotheses.size(); i++) {
            if (hypotheses.get(i).code().equals(code)) {
                return i;
            }
        }
        throw new IllegalArgumentException(code);
    }
}
