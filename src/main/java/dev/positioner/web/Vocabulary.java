package dev.positioner.web;

import com.fasterxml.jackson.annotation.JsonInclude;
import dev.positioner.asset.AssetDirectory;
import dev.positioner.knowledge.Catalogue;
import java.util.List;
import java.util.Locale;

/**
 * The codes a client sends, with the words a person reads for them, in catalogue file order (which
 * is the order a reliability engineer chose to present them in). Taken from the loaded knowledge
 * base, so a code added there reaches the page without a page change.
 */
public record Vocabulary(List<Symptom> symptoms, List<Quantity> measurements, List<Check> checks,
        List<Cause> faults, List<Tag> tags) {

    public record Symptom(String code, String text) {
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record Quantity(String code, String kind, List<String> units, String meaning) {
    }

    public record Check(String code, String title, double minutes, boolean bypassRequired, List<String> outcomes) {
    }

    public record Cause(String code, String title, String failureMode) {
    }

    @JsonInclude(JsonInclude.Include.NON_NULL)
    public record Tag(String tag, String description) {
    }

    static Vocabulary of(Catalogue c, AssetDirectory assets) {
        return new Vocabulary(
                c.symptoms().values().stream().map(s -> new Symptom(s.code(), s.text())).toList(),
                c.measurements().values().stream()
                        .map(q -> new Quantity(q.code(), q.kind().name().toLowerCase(Locale.ROOT), q.units(), q.meaning()))
                        .toList(),
                c.checks().values().stream()
                        .map(k -> new Check(k.code(), k.title(), k.minutes(), k.bypass(), k.outcomes())).toList(),
                c.hypotheses().stream().map(f -> new Cause(f.code(), f.title(), f.failureMode())).toList(),
                assets.all().stream().map(a -> new Tag(a.tag(), a.description())).toList());
    }
}
