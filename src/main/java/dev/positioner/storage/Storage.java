package dev.positioner.storage;

import io.agroal.api.AgroalDataSource;
import io.quarkus.agroal.DataSource;
import io.quarkus.arc.InjectableInstance;
import jakarta.enterprise.context.ApplicationScoped;
import java.sql.Connection;
import java.sql.SQLException;
import org.jboss.logging.Logger;

/**
 * The one active datasource and explicit transactions on it. The database kind is fixed when the
 * application is built, so both kinds are built in as named datasources and configuration decides
 * at start-up which one is active; exactly one must be.
 */
@ApplicationScoped
public class Storage {

    private static final Logger LOG = Logger.getLogger(Storage.class);
    /** SQLSTATE for a unique or primary key violation, the same on H2 and PostgreSQL. */
    private static final String UNIQUE_VIOLATION = "23505";

    private final AgroalDataSource dataSource;
    private final boolean postgres;

    public Storage(@DataSource("embedded") InjectableInstance<AgroalDataSource> embedded,
            @DataSource("pg") InjectableInstance<AgroalDataSource> pg) {
        boolean pgActive = !pg.listActive().isEmpty();
        boolean h2Active = !embedded.listActive().isEmpty();
        if (pgActive == h2Active) {
            throw new IllegalStateException("exactly one of the datasources 'embedded' and 'pg' must be active; "
                    + "use the 'pg' profile for PostgreSQL");
        }
        this.postgres = pgActive;
        this.dataSource = pgActive ? pg.get() : embedded.get();
        LOG.infof("Storage: %s", postgres ? "PostgreSQL (datasource 'pg')" : "embedded H2 (datasource 'embedded')");
    }

    public boolean isPostgres() {
        return postgres;
    }

    /** Runs work in one transaction: committed if it returns, rolled back if it throws. */
    public <T> T inTransaction(Work<T> work) {
        try (Connection c = dataSource.getConnection()) {
            c.setAutoCommit(false);
            try {
                T result = work.run(c);
                c.commit();
                return result;
            } catch (SQLException | RuntimeException e) {
                c.rollback();
                throw e;
            } finally {
                c.setAutoCommit(true);
            }
        } catch (SQLException e) {
            throw new StorageException(e);
        }
    }

    /** Reads with autocommit: one statement sees one consistent snapshot, and nothing is held open. */
    public <T> T read(Work<T> work) {
        try (Connection c = dataSource.getConnection()) {
            return work.run(c);
        } catch (SQLException e) {
            throw new StorageException(e);
        }
    }

    public static boolean isUniqueViolation(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException sql && UNIQUE_VIOLATION.equals(sql.getSQLState())) {
                return true;
            }
        }
        return false;
    }

    @FunctionalInterface
    public interface Work<T> {
        T run(Connection c) throws SQLException;
    }
}
