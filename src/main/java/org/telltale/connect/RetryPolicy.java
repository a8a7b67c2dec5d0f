package org.telltale.connect;

import java.time.Duration;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import java.util.concurrent.ThreadLocalRandom;

/**
 * When to try a failed request again: up to {@code retries} times, after an exponentially growing
 * delay with jitter, or after the delay the service named in Retry-After when that is longer.
 *
 * <p>The delay before retry {@code k} (0-based) is {@code base·2^k}, capped at {@link #MAX_DELAY},
 * then drawn uniformly from its upper half ("equal jitter", common practice) so that many clients
 * that failed together do not retry together.
 */
final class RetryPolicy {
    /** No single backoff delay grows beyond this. */
    static final Duration MAX_DELAY = Duration.ofSeconds(10);
    /** A Retry-After longer than this is not waited for: the run stops with a clear error instead. */
    static final Duration MAX_RETRY_AFTER = Duration.ofMinutes(2);

    private final int retries;
    private final Duration base;

    RetryPolicy(int retries, Duration base) {
        this.retries = retries;
        this.base = base;
    }

    int retries() {
        return retries;
    }

    /** The backoff before retry {@code attempt} (0-based), jittered with {@code unit} in [0, 1). */
    Duration backoff(int attempt, double unit) {
        long baseMillis = Math.max(1, base.toMillis());
        long ceiling = MAX_DELAY.toMillis();
        long exp = attempt >= 30 ? ceiling : Math.min(ceiling, baseMillis << attempt);
        long jittered = exp / 2 + (long) Math.floor(unit * (exp - exp / 2));
        return Duration.ofMillis(jittered);
    }

    /** The delay before retry {@code attempt}: the jittered backoff, or the service's Retry-After when longer. */
    Duration delay(int attempt, Duration retryAfter) {
        Duration d = backoff(attempt, ThreadLocalRandom.current().nextDouble());
        if (retryAfter != null && retryAfter.compareTo(d) > 0) {
            return retryAfter;
        }
        return d;
    }

    /**
     * Reads a Retry-After header value: delay-seconds or an HTTP-date (RFC 9110 §10.2.3). Returns
     * null when absent or unreadable; a date in the past is a zero delay.
     */
    static Duration parseRetryAfter(String value, ZonedDateTime now) {
        if (value == null || value.isBlank()) {
            return null;
        }
        String v = value.strip();
        if (v.chars().allMatch(Character::isDigit) && v.length() <= 9) {
            return Duration.ofSeconds(Long.parseLong(v));
        }
        try {
            ZonedDateTime when = ZonedDateTime.parse(v, DateTimeFormatter.RFC_1123_DATE_TIME.withLocale(Locale.ROOT));
            Duration d = Duration.between(now, when);
            return d.isNegative() ? Duration.ZERO : d;
        } catch (DateTimeParseException e) {
            return null;
        }
    }
}
