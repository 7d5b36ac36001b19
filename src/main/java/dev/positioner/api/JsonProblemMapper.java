package dev.positioner.api;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.exc.MismatchedInputException;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.ext.ExceptionMapper;
import jakarta.ws.rs.ext.Provider;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Malformed JSON, wrong types and broken character encodings are the client's mistake: a 400 that
 * names the field Jackson was reading, instead of the framework's default.
 */
@Provider
public class JsonProblemMapper implements ExceptionMapper<JsonProcessingException> {

    /** Wrong JSON types; registered on its own because the framework maps this type itself otherwise. */
    @Provider
    public static class MismatchedInput implements ExceptionMapper<MismatchedInputException> {
        @Override
        public Response toResponse(MismatchedInputException e) {
            return problem(e);
        }
    }

    @Override
    public Response toResponse(JsonProcessingException e) {
        return problem(e);
    }

    static Response problem(JsonProcessingException e) {
        String field = "$";
        if (e instanceof JsonMappingException mapping && !mapping.getPath().isEmpty()) {
            field = mapping.getPath().stream()
                    .map(ref -> ref.getFieldName() != null ? "." + ref.getFieldName() : "[" + ref.getIndex() + "]")
                    .collect(Collectors.joining("", "", "")).replaceFirst("^\\.", "");
        }
        String message = e.getOriginalMessage() == null ? "malformed JSON" : e.getOriginalMessage();
        int cut = message.indexOf('\n');
        return Problem.badRequest(List.of(new FieldError(field, "cannot read JSON: " + (cut > 0 ? message.substring(0, cut) : message))));
    }
}
