package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.time.Duration;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import org.junit.jupiter.api.Test;

class RetryPolicyTest {
    private final RetryPolicy policy = new RetryPolicy(5, Duration.ofMillis(200));

    @Test
    void backoffDoublesAndJittersWithinTheUpperHalf() {
        // Exponential backoff with "equal jitter" (common practice): [base·2^k / 2, base·2^k].
        assertEquals(Duration.ofMillis(100), policy.backoff(0, 0.0));
        assertEquals(Duration.ofMillis(199), policy.backoff(0, 0.999));
        assertEquals(Duration.ofMillis(400), policy.backoff(2, 0.0));
        assertEquals(Duration.ofMillis(5000), policy.backoff(20, 0.0)); // capped at 10 s
        assertEquals(Duration.ofMillis(5000), policy.backoff(63, 0.0));
    }

    @Test
    void aLongerRetryAfterWins() {
        assertEquals(Duration.ofSeconds(3), policy.delay(0, Duration.ofSeconds(3)));
    }

    @Test
    void readsRetryAfterAsSecondsOrHttpDate() {
        // RFC 9110 §10.2.3 examples: "Retry-After: Fri, 31 Dec 1999 23:59:59 GMT" and "Retry-After: 120".
        ZonedDateTime now = ZonedDateTime.of(1999, 12, 31, 23, 58, 59, 0, ZoneOffset.UTC);
        assertEquals(Duration.ofSeconds(120), RetryPolicy.parseRetryAfter("120", now));
        assertEquals(Duration.ofSeconds(60), RetryPolicy.parseRetryAfter("Fri, 31 Dec 1999 23:59:59 GMT", now));
        assertEquals(Duration.ZERO, RetryPolicy.parseRetryAfter("Fri, 31 Dec 1999 23:00:00 GMT", now));
        assertNull(RetryPolicy.parseRetryAfter("soon", now));
        assertNull(RetryPolicy.parseRetryAfter(null, now));
    }
}
