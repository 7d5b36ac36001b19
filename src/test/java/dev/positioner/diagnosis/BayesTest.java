package dev.positioner.diagnosis;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

/** Bayes updates against values computed by hand (arithmetic in the comments). */
class BayesTest {

    @Test
    void twoPiecesOfEvidenceByHand() {
        // Three causes with priors 0.5, 0.3, 0.2.
        // Evidence 1 (slow stroke present): P = 0.8, 0.4, 0.1.
        // Evidence 2 (filter dp high): P = 0.1, 0.9, 0.5.
        // Unnormalised: 0.5*0.8*0.1 = 0.040; 0.3*0.4*0.9 = 0.108; 0.2*0.1*0.5 = 0.010; sum 0.158.
        // Posterior: 0.040/0.158 = 0.253165; 0.108/0.158 = 0.683544; 0.010/0.158 = 0.063291.
        double[] p = Bayes.posterior(new double[] {0.5, 0.3, 0.2},
                List.of(new double[] {0.8, 0.4, 0.1}, new double[] {0.1, 0.9, 0.5}));
        assertArrayEquals(new double[] {0.253165, 0.683544, 0.063291}, p, 1e-6);
    }

    @Test
    void sequentialUpdateEqualsBatchPosterior() {
        double[] prior = {0.5, 0.3, 0.2};
        double[] e1 = {0.8, 0.4, 0.1};
        double[] e2 = {0.1, 0.9, 0.5};
        assertArrayEquals(Bayes.posterior(prior, List.of(e1, e2)), Bayes.update(Bayes.update(prior, e1), e2), 1e-12);
    }

    @Test
    void predictiveProbabilityOfAnOutcome() {
        // P(e) = 0.5*0.8 + 0.3*0.4 + 0.2*0.1 = 0.40 + 0.12 + 0.02 = 0.54
        assertEquals(0.54, Bayes.predictive(new double[] {0.5, 0.3, 0.2}, new double[] {0.8, 0.4, 0.1}), 1e-12);
    }

    @Test
    void manySmallLikelihoodsDoNotUnderflow() {
        // 400 pieces of evidence at 1e-3 each would underflow a plain product (1e-1200);
        // in log space the ratio between causes survives: 2^400 in favour of the first.
        double[] e = {2e-3, 1e-3};
        double[] p = Bayes.posterior(new double[] {0.5, 0.5}, java.util.Collections.nCopies(400, e));
        assertEquals(1.0, p[0], 1e-12);
        assertEquals(0, Bayes.argmax(p));
    }
}
