package dev.positioner.storage;

import dev.positioner.api.Problem;
import jakarta.ws.rs.core.Response;
import jakarta.ws.rs.ext.ExceptionMapper;
import jakarta.ws.rs.ext.Provider;
import org.jboss.logging.Logger;

/**
 * A database that does not answer is the server's trouble, not the client's: 503 so that a
 * maintenance system retries (with the same Idempotency-Key, which makes the retry safe).
 */
@Provider
public class StorageExceptionMapper implements ExceptionMapper<StorageException> {

    private static final Logger LOG = Logger.getLogger(StorageExceptionMapper.class);

    @Override
    public Response toResponse(StorageException e) {
        LOG.error("database failure", e);
        return Problem.response(new Problem("/problems/storage-unavailable", "Storage unavailable", 503,
                "the database did not complete the request; retry with the same Idempotency-Key", null, null));
    }
}
