package dev.positioner.storage;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.util.Locale;
import java.util.UUID;

/**
 * The PostgreSQL server the storage tests use, named by the libpq variables PGHOST, PGPORT, PGUSER
 * and PGPASSWORD (defaults 127.0.0.1, 5432, postgres, none), so CI can point the tests at any server.
 * Each caller gets a database of its own, created fresh and dropped afterwards.
 */
public final class PostgresServer {

    private PostgresServer() {
    }

    public static String host() {
        return env("PGHOST", "127.0.0.1");
    }

    public static String port() {
        return env("PGPORT", "5432");
    }

    public static String user() {
        return env("PGUSER", "postgres");
    }

    public static String password() {
        return env("PGPASSWORD", "");
    }

    public static String url(String database) {
        return "jdbc:postgresql://" + host() + ":" + port() + "/" + database;
    }

    /** Creates an empty database with a random name and returns the name. */
    public static String createDatabase(String purpose) {
        String name = ("positioner_" + purpose + "_" + UUID.randomUUID().toString().substring(0, 8)).toLowerCase(Locale.ROOT);
        admin("CREATE DATABASE " + name);
        return name;
    }

    /** FORCE (PostgreSQL 13+) ends connections a killed instance may have left behind. */
    public static void dropDatabase(String name) {
        admin("DROP DATABASE IF EXISTS " + name + " WITH (FORCE)");
    }

    private static void admin(String sql) {
        try (Connection c = DriverManager.getConnection(url("postgres"), user(), password());
                Statement s = c.createStatement()) {
            s.execute(sql);
        } catch (SQLException e) {
            throw new IllegalStateException("PostgreSQL at " + host() + ":" + port() + " as " + user()
                    + " did not accept '" + sql + "' (set PGHOST/PGPORT/PGUSER/PGPASSWORD): " + e.getMessage(), e);
        }
    }

    private static String env(String name, String fallback) {
        String v = System.getenv(name);
        return v == null || v.isBlank() ? fallback : v;
    }
}
