package dev.positioner.learning;

import dev.positioner.diagnosis.AssetSpec;
import dev.positioner.diagnosis.SymptomRateSource;
import dev.positioner.diagnosis.SymptomRates;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import org.eclipse.microprofile.config.inject.ConfigProperty;

/**
 * Symptom likelihoods from the catalogue plus what the closed jobs of this valve's site reported
 * (see {@link LearntSymptomRates}). By site, because what a work order mentions is a site's habit
 * as much as the fault's physics. Reopened and "not_found" closures do not count: neither says which
 * cause the symptoms belonged to. Replaces the catalogue-only default bean.
 */
@ApplicationScoped
public class ClosureSymptomRates implements SymptomRateSource {

    private final Storage storage;
    private final double weight;

    public ClosureSymptomRates(Storage storage,
            @ConfigProperty(name = "positioner.learning.symptom-weight", defaultValue = "10") double weight) {
        this.storage = storage;
        this.weight = weight;
    }

    @Override
    public SymptomRates rates(Catalogue catalogue, AssetSpec asset) {
        if (asset.tag() == null) {
            return SymptomRates.catalogue(catalogue);
        }
        String site = asset.site();
        LearntSymptomRates.Counts counts = new LearntSymptomRates.Counts();
        storage.read(c -> {
            // Two plain statements rather than one UNION ALL: H2 keeps a parsed plan for each of these
            // but re-parses and re-plans a UNION on every call, which cost about 0.5 ms of server CPU
            // per diagnosis (src/bench/http-benchmark.sh, server CPU per request).
            try (PreparedStatement ps = c.prepareStatement("SELECT k.fault, s.symptom,"
                    + " SUM(CASE WHEN s.present THEN 1 ELSE 0 END), COUNT(*) FROM closure k"
                    + " JOIN closure_symptom s ON s.session_id = k.session_id AND s.seq = k.seq"
                    + " WHERE k.reopened_at IS NULL AND k.site IS NOT DISTINCT FROM ? GROUP BY k.fault, s.symptom")) {
                ps.setString(1, site);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        if (catalogue.faults().containsKey(rs.getString(1))) {
                            counts.add(rs.getString(2), rs.getString(1), rs.getInt(3), rs.getInt(4));
                        }
                    }
                }
            }
            try (PreparedStatement ps = c.prepareStatement("SELECT COUNT(*) FROM closure k WHERE k.reopened_at IS NULL"
                    + " AND k.fault <> 'not_found' AND k.site IS NOT DISTINCT FROM ? AND EXISTS (SELECT 1 FROM closure_symptom s"
                    + " WHERE s.session_id = k.session_id AND s.seq = k.seq)")) {
                ps.setString(1, site);
                try (ResultSet rs = ps.executeQuery()) {
                    rs.next();
                    counts.addJobs(rs.getInt(1));
                }
            }
            return null;
        });
        return LearntSymptomRates.rates(catalogue, counts, weight, site == null ? "on valves without a site" : "on site " + site);
    }
}
