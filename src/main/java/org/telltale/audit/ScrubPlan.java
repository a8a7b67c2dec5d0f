package org.telltale.audit;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;

/**
 * The rewrites one audit's scrub test rescored, decided on the driver before any is run: each
 * artefact alone on the explained documents assigned its label, each kind's open artefacts
 * together, and all open artefacts at once — on the explained documents, or with
 * {@code --scrub-all} on the corpus. A front runs the plan where the documents are
 * ({@link ScrubTest#explained}, {@link ScrubTest#corpus}) and reduces the parts with
 * {@link ScrubEffects#merge}; the plan numbers its jobs, and the effects come back by number.
 *
 * <p>Immutable; serializable, so that a distributed front can ship it to its tasks.
 */
public final class ScrubPlan implements Serializable {
    private static final long serialVersionUID = 1L;

    /**
     * One rewrite and the documents it is measured on.
     *
     * @param label   only documents the model assigned this label, whose score is the one measured;
     *                {@code null} for every document, each measured on its own prediction
     * @param targets what the rewrite removes, together
     * @param corpus  whether the documents are the corpus ({@code --scrub-all}) rather than the explained ones
     */
    record Job(String label, List<Rewriter.Target> targets, boolean corpus) implements Serializable {
        private static final long serialVersionUID = 1L;

        Job {
            targets = List.copyOf(targets);
        }
    }

    private final List<Job> jobs;

    private ScrubPlan(List<Job> jobs) {
        this.jobs = List.copyOf(jobs);
    }

    /** How many jobs. */
    public int size() {
        return jobs.size();
    }

    /** Whether a job rescored the whole corpus, not only the explained documents. */
    public boolean scrubsCorpus() {
        return jobs.stream().anyMatch(Job::corpus);
    }

    Job job(int number) {
        return jobs.get(number);
    }

    @Override
    public String toString() {
        return "ScrubPlan" + jobs;
    }

    /** Collects jobs in order; each call answers the job's number. Not thread-safe. */
    static final class Builder {
        private final List<Job> jobs = new ArrayList<>();

        /** Removing one artefact alone from the explained documents the model assigned {@code label}. */
        int alone(String label, Rewriter.Target target) {
            jobs.add(new Job(label, List.of(target), false));
            return jobs.size() - 1;
        }

        /** Removing {@code targets} together from every explained document, or from the corpus. */
        int together(List<Rewriter.Target> targets, boolean corpus) {
            jobs.add(new Job(null, targets, corpus));
            return jobs.size() - 1;
        }

        ScrubPlan build() {
            return new ScrubPlan(jobs);
        }
    }
}
