package dev.positioner.storage;

import io.quarkus.test.junit.QuarkusTestProfile;
import java.util.List;

/** Test profile: the same application on a fresh PostgreSQL database instead of the embedded one. */
public class OnPostgres implements QuarkusTestProfile {

    @Override
    public List<TestResourceEntry> testResources() {
        return List.of(new TestResourceEntry(FreshPostgresDatabase.class));
    }
}
