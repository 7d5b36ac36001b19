package dev.positioner.session;

import dev.positioner.storage.OnPostgres;
import io.quarkus.test.junit.QuarkusTest;
import io.quarkus.test.junit.TestProfile;

/** The same session flow on a fresh PostgreSQL database of its own. */
@QuarkusTest
@TestProfile(OnPostgres.class)
class SessionFlowPostgresTest extends SessionFlowContract {
}
