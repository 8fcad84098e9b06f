package org.wurtzkit.examples.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.ObjectInputStream;
import java.io.ObjectOutputStream;
import org.apache.spark.api.java.JavaSparkContext;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.wurtzkit.solvers.workflow.Evaluation;
import org.wurtzkit.solvers.workflow.ToleranceStudy;
import org.wurtzkit.solvers.workflow.ToleranceStudyResult;

/**
 * The tolerance study of the invented demo wafer on Apache Spark in local mode ({@code local[2]}):
 * the same numbers as the local run, bit for bit. Runs only in the {@code spark} profile.
 */
class SparkToleranceStudyTest {
    private static JavaSparkContext spark;

    @BeforeAll
    static void start() {
        spark = new JavaSparkContext(SparkToleranceStudy.conf("local[2]"));
        spark.setLogLevel("WARN");
    }

    @AfterAll
    static void stop() {
        if (spark != null) {
            spark.close();
        }
    }

    /**
     * n_s and V_th of every evaluation (Sobol design, 2 rows x 8) from Spark tasks equal the local
     * two-thread run bit for bit, for 1 and 3 partitions; so do the statistics and indices.
     */
    @Test
    void sparkLocalModeEqualsTheLocalRunBitForBit() {
        DemoWaferRecipe recipe = new DemoWaferRecipe(2, 1.5, 731, true);
        ToleranceStudy study = recipe.build();
        ToleranceStudyResult local = org.wurtzkit.examples.ToleranceStudyExample.study(recipe.settings(), 2, (d, t) -> {
        }).run();
        assertEquals(16, local.size());
        assertTrue(local.failures().isEmpty(), () -> local.failures().toString());
        for (int partitions : new int[] {1, 3}) {
            ToleranceStudyResult distributed = SparkToleranceStudy.run(spark, recipe, partitions);
            assertEquals(study.size(), distributed.size());
            for (int j = 0; j < local.size(); j++) {
                for (int q = 0; q < 2; q++) {
                    assertEquals(Double.doubleToRawLongBits(local.value(j, q)),
                            Double.doubleToRawLongBits(distributed.value(j, q)),
                            "evaluation " + j + " output " + q + ", " + partitions + " partitions");
                }
            }
            assertTrue(SparkToleranceStudy.identical(local, distributed));
            assertEquals(local.summary(1), distributed.summary(1));
            assertEquals(local.sensitivity(0), distributed.sensitivity(0));
        }
    }

    /** What crosses the wire survives Java serialization unchanged (Spark's default for task closures). */
    @Test
    void recipeAndEvaluationsSerialize() throws IOException, ClassNotFoundException {
        DemoWaferRecipe recipe = new DemoWaferRecipe(2, 1.5, 9, false);
        Evaluation e = recipe.build().evaluate(3);
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (ObjectOutputStream out = new ObjectOutputStream(bytes)) {
            out.writeObject(recipe);
            out.writeObject(e);
        }
        try (ObjectInputStream in = new ObjectInputStream(new ByteArrayInputStream(bytes.toByteArray()))) {
            assertEquals(recipe, in.readObject());
            assertEquals(e, in.readObject());
        }
    }
}
