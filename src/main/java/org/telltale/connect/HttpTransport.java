package org.telltale.connect;

import java.io.IOException;
import java.net.ConnectException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.net.http.HttpTimeoutException;
import java.time.Duration;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.TimeoutException;
import org.telltale.model.ClassifierException;

/**
 * One HTTP exchange with a model service through the JDK's {@link HttpClient}: sends the secret
 * headers, bounds the whole exchange (headers and body) by the timeout, and sorts failures into
 * retryable ({@link TransientFailure}: timeouts, refused or reset connections, 408, 429, 5xx) and
 * final ({@link ClassifierException}: other statuses).
 */
final class HttpTransport implements AutoCloseable {
    private final HttpClient client;
    private final Duration timeout;
    private final Map<String, String> headers;

    HttpTransport(Duration timeout, Map<String, String> headers) {
        this.timeout = timeout;
        this.headers = headers;
        this.client = HttpClient.newBuilder()
                .version(HttpClient.Version.HTTP_1_1)
                .connectTimeout(timeout)
                .followRedirects(HttpClient.Redirect.NEVER)
                .build();
    }

    byte[] post(URI uri, byte[] body) {
        return exchange(builder(uri).POST(HttpRequest.BodyPublishers.ofByteArray(body))
                .header("Content-Type", "application/json").build());
    }

    byte[] get(URI uri) {
        return exchange(builder(uri).GET().build());
    }

    private HttpRequest.Builder builder(URI uri) {
        HttpRequest.Builder b = HttpRequest.newBuilder(uri).timeout(timeout).header("Accept", "application/json");
        headers.forEach(b::header);
        return b;
    }

    private byte[] exchange(HttpRequest request) {
        String where = Endpoints.safe(request.uri());
        CompletableFuture<HttpResponse<byte[]>> future = client.sendAsync(request, HttpResponse.BodyHandlers.ofByteArray());
        HttpResponse<byte[]> response;
        try {
            // The request timeout alone stops at the response headers; this bounds the body too.
            response = future.get(timeout.toMillis(), TimeUnit.MILLISECONDS);
        } catch (TimeoutException e) {
            future.cancel(true);
            throw new TransientFailure("no answer from " + where + " within " + Durations.format(timeout));
        } catch (InterruptedException e) {
            future.cancel(true);
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        } catch (ExecutionException e) {
            throw failure(where, e.getCause());
        }
        int status = response.statusCode();
        byte[] body = response.body() == null ? new byte[0] : response.body();
        if (status / 100 == 2) {
            return body;
        }
        String detail = "HTTP " + status + " from " + where + "; response: " + Snippet.of(body);
        if (status == 429 || status == 408 || status / 100 == 5) {
            Duration after = RetryPolicy.parseRetryAfter(response.headers().firstValue("Retry-After").orElse(null),
                    ZonedDateTime.now(ZoneOffset.UTC));
            throw new TransientFailure(detail, after, null);
        }
        throw new ClassifierException(detail);
    }

    private TransientFailure failure(String where, Throwable cause) {
        if (cause instanceof HttpTimeoutException) {
            return new TransientFailure("no answer from " + where + " within " + Durations.format(timeout), cause);
        }
        if (cause instanceof ConnectException) {
            return new TransientFailure("cannot connect to " + where + " (" + describe(cause) + ")", cause);
        }
        if (cause instanceof IOException) {
            return new TransientFailure("the connection to " + where + " failed (" + describe(cause) + ")", cause);
        }
        return new TransientFailure("the request to " + where + " failed (" + describe(cause) + ")", cause);
    }

    private static String describe(Throwable t) {
        String m = t.getMessage();
        String kind = t.getClass().getSimpleName();
        return m == null || m.isBlank() ? kind : kind + ": " + m;
    }

    @Override
    public void close() {
        // HttpClient in Java 17 has no close(); its threads are daemons and its connections idle out.
    }
}
