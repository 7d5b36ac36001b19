package dev.positioner.session;

import io.quarkus.test.junit.QuarkusTest;

/** The session flow on the embedded H2 database (the default). */
@QuarkusTest
class SessionFlowH2Test extends SessionFlowContract {
}
