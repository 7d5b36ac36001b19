package dev.positioner.knowledge;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.drools.model.codegen.ExecutableModelProject;
import org.kie.api.KieBase;
import org.kie.api.KieServices;
import org.kie.api.builder.KieBuilder;
import org.kie.api.builder.KieFileSystem;
import org.kie.api.builder.Message;
import org.kie.api.definition.rule.Rule;

/**
 * Compiles every {@code .drl} file under {@code rules/} into one KIE base through the plain KIE API
 * and the executable model. Besides compiler errors it enforces two house rules that keep the base
 * readable: a file's {@code package} matches its folder, and every rule name starts with a stable
 * ID ({@code INT-SUP-01 ...}) that is unique, so closures and tests can name the rule that fired.
 */
final class RuleCompiler {

    static final Pattern RULE_ID = Pattern.compile("^([A-Z]+(?:-[A-Z0-9]+)*-\\d{2,3}) .+");
    private static final Pattern CAUTION = Pattern.compile("new (Caution|Alert)\\(\"([^\"]*)\"\\)");
    private static final Pattern PACKAGE = Pattern.compile("(?m)^\\s*package\\s+([\\w.]+)\\s*;?");

    private final Path rulesDir;
    private final List<KnowledgeProblem> problems;
    private final java.util.Set<String> cautionCodes;
    private final java.util.Set<String> alertCodes;

    /** @param cautionCodes, alertCodes the caution and alert codes of the catalogue, which rules may insert */
    RuleCompiler(Path rulesDir, List<KnowledgeProblem> problems, java.util.Set<String> cautionCodes, java.util.Set<String> alertCodes) {
        this.rulesDir = rulesDir;
        this.problems = problems;
        this.cautionCodes = cautionCodes;
        this.alertCodes = alertCodes;
    }

    KieBase compile() {
        KieServices services = KieServices.Factory.get();
        KieFileSystem files = services.newKieFileSystem();
        try (Stream<Path> walk = Files.walk(rulesDir)) {
            for (Path drl : walk.filter(p -> p.toString().endsWith(".drl")).sorted().toList()) {
                String relative = rulesDir.relativize(drl).toString().replace('\\', '/');
                String text = Files.readString(drl);
                checkPackage(relative, text);
                checkCautions(relative, text);
                files.write("src/main/resources/" + relative, text);
            }
        } catch (IOException e) {
            problems.add(new KnowledgeProblem("rules/", 0, null, "cannot read rules: " + e.getMessage()));
            return null;
        }
        KieBuilder builder = services.newKieBuilder(files).buildAll(ExecutableModelProject.class);
        List<Message> errors = builder.getResults().getMessages(Message.Level.ERROR);
        for (Message m : errors) {
            String path = m.getPath() == null ? "rules/" : "rules/" + m.getPath().replaceFirst("^src/main/resources/", "");
            problems.add(new KnowledgeProblem(path, m.getLine(), null, "DRL: " + m.getText().strip()));
        }
        if (!errors.isEmpty()) {
            return null;
        }
        KieBase base = services.newKieContainer(services.getRepository().getDefaultReleaseId()).getKieBase();
        checkRuleNames(base);
        return base;
    }

    private void checkPackage(String relative, String text) {
        int slash = relative.lastIndexOf('/');
        String expected = slash < 0 ? "" : relative.substring(0, slash).replace('/', '.');
        Matcher m = PACKAGE.matcher(text);
        String found = m.find() ? m.group(1) : "";
        if (!found.equals(expected)) {
            problems.add(new KnowledgeProblem("rules/" + relative, 1, null,
                    "package '" + found + "' must match its folder '" + expected + "'"));
        }
    }

    /** A rule that inserts an unknown caution or alert would show the technician a bare code; catch it at start-up. */
    private void checkCautions(String relative, String text) {
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            Matcher m = CAUTION.matcher(lines[i]);
            while (m.find()) {
                boolean caution = m.group(1).equals("Caution");
                if (!(caution ? cautionCodes : alertCodes).contains(m.group(2))) {
                    problems.add(new KnowledgeProblem("rules/" + relative, i + 1, null, (caution ? "caution '" : "alert '")
                            + m.group(2) + "' is not in rules/catalogue/" + (caution ? "cautions.yaml" : "alerts.yaml")));
                }
            }
        }
    }

    private void checkRuleNames(KieBase base) {
        Map<String, String> seen = new HashMap<>();
        base.getKiePackages().forEach(pkg -> pkg.getRules().forEach((Rule rule) -> {
            Matcher m = RULE_ID.matcher(rule.getName());
            if (!m.matches()) {
                problems.add(new KnowledgeProblem("rules/" + pkg.getName().replace('.', '/'), 0, rule.getName(),
                        "rule name must start with a stable ID such as 'INT-SUP-01 '"));
            } else if (seen.put(m.group(1), rule.getName()) != null) {
                problems.add(new KnowledgeProblem("rules/" + pkg.getName().replace('.', '/'), 0, rule.getName(),
                        "rule ID " + m.group(1) + " is used twice"));
            }
        }));
    }

    static String ruleId(String ruleName) {
        Matcher m = RULE_ID.matcher(ruleName);
        return m.matches() ? m.group(1) : ruleName;
    }
}
