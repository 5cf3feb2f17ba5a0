/**
 * The invented demo clinic (Spring profile {@code demo}, switched on by {@code ./mvnw spring-boot:test-run}):
 * staff accounts, a few invented patients, and a second clinic that proves tenant isolation. No real people,
 * places, brands or products. Other features seed their own demo records after this one (see {@link DemoIds}).
 */
package org.swingclearance.demo;
