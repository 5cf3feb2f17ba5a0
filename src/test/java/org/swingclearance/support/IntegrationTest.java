package org.swingclearance.support;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;
import org.springframework.boot.test.context.SpringBootTest;
import org.springframework.boot.webmvc.test.autoconfigure.AutoConfigureMockMvc;
import org.springframework.context.annotation.Import;

/**
 * The one way to start the full application in a test: a real server on a random port (for the browser tests)
 * plus MockMvc, on real PostgreSQL through {@link PostgresTestBase}. Every integration test uses exactly this,
 * so the whole suite shares one Spring context (one clean + migrate) and no test depends on another's data.
 */
@Target(ElementType.TYPE)
@Retention(RetentionPolicy.RUNTIME)
@SpringBootTest(webEnvironment = SpringBootTest.WebEnvironment.RANDOM_PORT)
@AutoConfigureMockMvc
@Import(TestData.class)
public @interface IntegrationTest {
}
