package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.stream.Collectors;
import java.util.stream.IntStream;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.model.NaiveBayesModel;

/**
 * On 32 queues where a product model in the text legitimately predicts the queue and a routing
 * code in a header line leaks it, the product models are vocabulary and the routing code is one
 * header artefact per queue.
 */
@Tag("slow")
class ManyQueueAuditTest {

    @Test
    void productCodesAreNoArtefactAndTheRoutingCodeIsOneArtefactPerQueue(@TempDir Path dir) throws Exception {
        NaiveBayesModel model = TrainedModels.naiveBayes(RouterQueues.generate(1, 40));
        Path corpus = UtilityQueues.write(RouterQueues.generate(2, 30), dir.resolve("desk.jsonl"));
        AuditResult result = AuditRuns.run(model, corpus, AuditRuns.settings(160, 300, 8), 5, Policy.empty(), dir)
                .result();
        String found = ArtefactAuditTest.describe(result);
        Set<String> products = IntStream.range(0, RouterQueues.QUEUES)
                .mapToObj(q -> RouterQueues.productCode(q).toLowerCase(Locale.ROOT)).collect(Collectors.toSet());
        assertTrue(result.artefacts().stream().flatMap(a -> a.termNames().stream()).noneMatch(products::contains),
                "a product model became an artefact:" + found);
        int withRouting = 0;
        for (int q = 0; q < RouterQueues.QUEUES; q++) {
            String label = RouterQueues.queue(q);
            String code = RouterQueues.routingCode(q).toLowerCase(Locale.ROOT);
            List<Artefact> routing = result.artefacts().stream()
                    .filter(a -> a.label().equals(label) && a.termNames().contains(code)).toList();
            assertTrue(routing.size() <= 1, label + ": " + routing);
            if (routing.size() == 1) {
                assertEquals(ArtefactKind.HEADER, routing.get(0).kind(), found);
                assertEquals("X-Route: " + code, routing.get(0).pattern(), found);
                withRouting++;
            }
        }
        assertEquals(RouterQueues.QUEUES, withRouting, "every queue carries its routing code:" + found);
        assertTrue(result.artefacts().stream().allMatch(a -> a.kind() == ArtefactKind.HEADER), found);
    }
}
