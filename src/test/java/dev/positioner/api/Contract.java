package dev.positioner.api;

import com.atlassian.oai.validator.OpenApiInteractionValidator;
import com.atlassian.oai.validator.report.LevelResolver;
import com.atlassian.oai.validator.report.ValidationReport;
import com.atlassian.oai.validator.restassured.OpenApiValidationFilter;

/**
 * Every HTTP test sends its requests through this filter, which fails the test when a request or
 * response departs from openapi/openapi.yaml: the contract file is the source of truth.
 */
public final class Contract {

    public static final OpenApiValidationFilter VALIDATED = new OpenApiValidationFilter(
            OpenApiInteractionValidator.createForSpecificationUrl("openapi/openapi.yaml").build());

    /**
     * For tests that send a malformed request on purpose: the request is not checked against the
     * contract (it is meant to break it), the error response still is.
     */
    public static final OpenApiValidationFilter RESPONSES = new OpenApiValidationFilter(
            OpenApiInteractionValidator.createForSpecificationUrl("openapi/openapi.yaml")
                    .withLevelResolver(LevelResolver.create()
                            .withLevel("validation.request", ValidationReport.Level.IGNORE).build())
                    .build());

    /** JSON numbers read as doubles, so closeTo(...) matchers compare like with like. */
    public static final io.restassured.config.RestAssuredConfig DOUBLES = io.restassured.config.RestAssuredConfig.config()
            .jsonConfig(io.restassured.config.JsonConfig.jsonConfig()
                    .numberReturnType(io.restassured.path.json.config.JsonPathConfig.NumberReturnType.DOUBLE));

    private Contract() {
    }
}
