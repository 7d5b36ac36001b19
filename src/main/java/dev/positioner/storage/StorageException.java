package dev.positioner.storage;

import java.sql.SQLException;

/** A database failure that the caller cannot fix by changing its request. */
public class StorageException extends RuntimeException {

    public StorageException(SQLException cause) {
        super(cause.getMessage(), cause);
    }

    public SQLException sqlException() {
        return (SQLException) getCause();
    }
}
