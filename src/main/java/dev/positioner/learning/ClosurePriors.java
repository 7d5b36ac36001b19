package dev.positioner.learning;

import dev.positioner.diagnosis.AssetSpec;
import dev.positioner.diagnosis.PriorSource;
import dev.positioner.diagnosis.Priors;
import dev.positioner.knowledge.Catalogue;
import dev.positioner.knowledge.Fault;
import dev.positioner.storage.Storage;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.util.List;
import java.util.Locale;
import org.eclipse.microprofile.config.inject.ConfigProperty;

/**
 * Priors from the catalogue plus the confirmed closures of this valve and its site (see
 * {@link DirichletPriors}). Replaces the catalogue-only default bean. Closures that were reopened
 * and "not_found" closures do not count: neither says which cause it was.
 */
@ApplicationScoped
public class ClosurePriors implements PriorSource {

    private final Storage storage;
    private final double n0;
    private final double siteWeight;

    public ClosurePriors(Storage storage,
            @ConfigProperty(name = "positioner.learning.catalogue-weight", defaultValue = "50") double n0,
            @ConfigProperty(name = "positioner.learning.site-weight", defaultValue = "0.5") double siteWeight) {
        this.storage = storage;
        this.n0 = n0;
        this.siteWeight = siteWeight;
    }

    @Override
    public Priors priors(Catalogue catalogue, AssetSpec asset) {
        List<Fault> hypotheses = catalogue.hypotheses();
        double[] base = hypotheses.stream().mapToDouble(Fault::prior).toArray();
        if (asset.tag() == null) {
            return new Priors(base, "Prior from the fault catalogue (no valve tag given, so no closure history applied).");
        }
        String site = asset.site();
        int[] tag = new int[base.length];
        int[] other = new int[base.length];
        count(hypotheses, asset.tag(), site, tag, other);
        int t = sum(tag);
        int s = sum(other);
        String where = site == null ? "other valves without a site" : "other valves of site " + site;
        if (t + s == 0) {
            return new Priors(base, "Prior from the fault catalogue: no confirmed closures yet on " + asset.tag()
                    + " or on " + where + ".");
        }
        double[] learnt = DirichletPriors.update(base, tag, other, n0, siteWeight);
        String[] notes = new String[base.length];
        for (int h = 0; h < base.length; h++) {
            if (tag[h] + other[h] > 0) {
                String onTag = tag[h] == 0 ? null : times(tag[h]) + " on " + asset.tag();
                String onSite = other[h] == 0 ? null : times(other[h]) + " on " + where;
                notes[h] = String.format(Locale.ROOT, "Confirmed %s in past closures; prior %s from %.1f %% to %.1f %%.",
                        onTag == null ? onSite : onSite == null ? onTag : onTag + " and " + onSite,
                        learnt[h] >= base[h] ? "raised" : "lowered", 100 * base[h], 100 * learnt[h]);
            }
        }
        String basis = String.format(Locale.ROOT, "Prior: the fault catalogue counted as %s closures, plus %d confirmed closure(s)"
                + " on %s (each counts 1) and %d on %s (each counts %s); Dirichlet posterior mean.",
                plain(n0), t, asset.tag(), s, where, plain(siteWeight));
        return new Priors(learnt, basis, notes);
    }

    private void count(List<Fault> hypotheses, String tag, String site, int[] onTag, int[] onOthers) {
        storage.read(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT fault, SUM(CASE WHEN tag = ? THEN 1 ELSE 0 END),"
                    + " SUM(CASE WHEN tag = ? THEN 0 ELSE 1 END) FROM closure WHERE reopened_at IS NULL"
                    + " AND (tag = ? OR site IS NOT DISTINCT FROM ?) GROUP BY fault")) {
                ps.setString(1, tag);
                ps.setString(2, tag);
                ps.setString(3, tag);
                ps.setString(4, site);
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) {
                        int h = index(hypotheses, rs.getString(1));
                        if (h >= 0) {
                            onTag[h] = rs.getInt(2);
                            onOthers[h] = rs.getInt(3);
                        }
                    }
                }
            }
            return null;
        });
    }

    private static int index(List<Fault> hypotheses, String code) {
        for (int h = 0; h < hypotheses.size(); h++) {
            if (hypotheses.get(h).code().equals(code)) {
                return h;
            }
        }
        return -1;
    }

    private static int sum(int[] a) {
        int s = 0;
        for (int x : a) {
            s += x;
        }
        return s;
    }

    private static String times(int n) {
        return n == 1 ? "once" : n + " times";
    }

    private static String plain(double x) {
        return x == Math.rint(x) ? String.valueOf((long) x) : String.valueOf(x);
    }
}
