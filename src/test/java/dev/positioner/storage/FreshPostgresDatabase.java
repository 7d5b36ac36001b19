package dev.positioner.storage;

import io.quarkus.test.common.QuarkusTestResourceLifecycleManager;
import java.util.Map;

/** Gives a Quarkus test run a new PostgreSQL database and drops it when the run ends. */
public class FreshPostgresDatabase implements QuarkusTestResourceLifecycleManager {

    private String database;

    @Override
    public Map<String, String> start() {
        database = PostgresServer.createDatabase("test");
        return Map.of(
                "quarkus.datasource.embedded.active", "false",
                "quarkus.datasource.pg.active", "true",
                "quarkus.datasource.pg.jdbc.url", PostgresServer.url(database),
                "quarkus.datasource.pg.username", PostgresServer.user(),
                "quarkus.datasource.pg.password", PostgresServer.password());
    }

    @Override
    public void stop() {
        if (database != null) {
            PostgresServer.dropDatabase(database);
        }
    }
}
