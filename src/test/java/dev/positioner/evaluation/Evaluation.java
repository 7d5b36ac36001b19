package dev.positioner.evaluation;

import dev.positioner.asset.AssetDirectory;
import dev.positioner.asset.DemoPlant;
import dev.positioner.diagnosis.CataloguePriors;
import dev.positioner.diagnosis.CatalogueSymptomRates;
import dev.positioner.diagnosis.DiagnosisService;
import dev.positioner.diagnosis.PriorSource;
import dev.positioner.diagnosis.RuleEngine;
import dev.positioner.diagnosis.SymptomRateSource;
import dev.positioner.knowledge.KnowledgeBase;
import dev.positioner.knowledge.KnowledgeBaseLoader;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.lang.reflect.Constructor;
import java.lang.reflect.Parameter;
import java.nio.file.Path;
import java.util.Properties;
import org.eclipse.microprofile.config.inject.ConfigProperty;

/**
 * The service as the evaluation runs it: built directly (no container) on the real knowledge base,
 * the invented demo plant and catalogue priors, with every configured number (stopping threshold,
 * bypass penalty, ...) taken from application.properties with the test profile applied. Reading the
 * constructor's own {@code @ConfigProperty} names keeps the evaluation on the settings the service
 * ships with, whatever settings are added later.
 */
final class Evaluation {

    final KnowledgeBase kb;
    final DiagnosisService service;
    final double stopThreshold;
    final String settings;

    Evaluation() {
        kb = KnowledgeBaseLoader.load(Path.of("rules"));
        Properties config = config();
        stopThreshold = Double.parseDouble(setting(config, "positioner.stop-threshold", null));
        StringBuilder used = new StringBuilder();
        service = build(kb, config, used, new CatalogueSymptomRates());
        settings = used.toString();
    }

    /** The same service with its symptom likelihoods from {@code rates}, e.g. learnt from other case sets. */
    DiagnosisService withSymptomRates(SymptomRateSource rates) {
        return build(kb, config(), new StringBuilder(), rates);
    }

    /** A setting as the service reads it, e.g. the weight of the catalogue when learning symptom likelihoods. */
    static double setting(String name) {
        return Double.parseDouble(setting(config(), name, null));
    }

    private static DiagnosisService build(KnowledgeBase kb, Properties config, StringBuilder used, SymptomRateSource rates) {
        Constructor<?> constructor = DiagnosisService.class.getConstructors()[0];
        Parameter[] parameters = constructor.getParameters();
        Object[] args = new Object[parameters.length];
        for (int i = 0; i < parameters.length; i++) {
            Class<?> type = parameters[i].getType();
            ConfigProperty property = parameters[i].getAnnotation(ConfigProperty.class);
            if (type == KnowledgeBase.class) {
                args[i] = kb;
            } else if (type == RuleEngine.class) {
                args[i] = new RuleEngine(kb);
            } else if (type == AssetDirectory.class) {
                args[i] = new DemoPlant(true);
            } else if (type == PriorSource.class) {
                args[i] = new CataloguePriors();
            } else if (type == SymptomRateSource.class) {
                args[i] = rates;
            } else if (property != null && (type == double.class || type == int.class || type == boolean.class)) {
                String fallback = ConfigProperty.UNCONFIGURED_VALUE.equals(property.defaultValue()) ? null : property.defaultValue();
                String text = setting(config, property.name(), fallback);
                args[i] = type == double.class ? Double.parseDouble(text) : type == int.class ? (Object) Integer.parseInt(text)
                        : (Object) Boolean.parseBoolean(text);
                used.append(used.isEmpty() ? "" : ", ").append(property.name()).append(" = ").append(args[i]);
            } else {
                throw new IllegalStateException("the evaluation does not know how to supply " + parameters[i]
                        + " of the DiagnosisService constructor; extend Evaluation");
            }
        }
        try {
            return (DiagnosisService) constructor.newInstance(args);
        } catch (ReflectiveOperationException e) {
            throw new IllegalStateException("cannot build DiagnosisService", e);
        }
    }

    /** A system property of the same name overrides the file, to try other settings: -Dpositioner.minimum-gain=0. */
    private static String setting(Properties config, String name, String fallback) {
        String value = System.getProperty(name, config.getProperty("%test." + name, config.getProperty(name, fallback)));
        if (value == null) {
            throw new IllegalStateException(name + " is not set in application.properties");
        }
        return value;
    }

    private static Properties config() {
        Properties p = new Properties();
        try (InputStream in = Evaluation.class.getResourceAsStream("/application.properties")) {
            p.load(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return p;
    }
}
