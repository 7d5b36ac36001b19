package dev.positioner.session;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.positioner.api.InvalidRequestException;
import dev.positioner.storage.ProblemException;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Objects;

/**
 * Retry safety for POSTs. A client names its request with an {@code Idempotency-Key} header or the
 * body's client id; the key is stored with what the request created, under a unique constraint, so
 * a retry finds it and gets the first answer back instead of a second copy. The request's hash is
 * kept too: the same key on a different request is the client's bug and is refused (422).
 */
final class Idempotency {

    static final int MAX_KEY = 200;

    private Idempotency() {
    }

    static String key(String header, String bodyId, String bodyField) {
        String h = header == null || header.isBlank() ? null : header.strip();
        String b = bodyId == null || bodyId.isBlank() ? null : bodyId.strip();
        if (h != null && b != null && !h.equals(b)) {
            throw new InvalidRequestException(bodyField, "differs from the Idempotency-Key header; send one key or the same in both");
        }
        String key = h != null ? h : b;
        if (key != null && key.length() > MAX_KEY) {
            throw new InvalidRequestException(h != null ? "Idempotency-Key" : bodyField, "is longer than " + MAX_KEY + " characters");
        }
        return key;
    }

    static String hash(ObjectMapper json, Object request) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(json.writeValueAsString(request).getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest);
        } catch (JsonProcessingException | NoSuchAlgorithmException e) {
            throw new IllegalStateException("cannot hash request", e);
        }
    }

    static void requireSame(String storedHash, String hash, String key) {
        if (!Objects.equals(storedHash, hash)) {
            throw new ProblemException(422, "idempotency-key-reused", "Idempotency key reused",
                    "key '" + key + "' was first used for a different request; use a new key for a new request");
        }
    }
}
