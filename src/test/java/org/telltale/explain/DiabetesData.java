package org.telltale.explain;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.zip.GZIPInputStream;

/**
 * The diabetes data of Efron et al. 2004 (442 patients, 10 baseline variables) as Debian's
 * python3-sklearn package ships it, read from the installed package, never copied into the
 * repository; and the reference values src/test/reference/fit_references.py computed from it.
 */
final class DiabetesData {
    static final Path DIR = Path.of("/usr/lib/python3/dist-packages/sklearn/datasets/data");

    final double[][] x; // scaled as sklearn's load_diabetes(scaled=True): centred, unit-norm columns
    final double[] y;

    private DiabetesData(double[][] x, double[] y) {
        this.x = x;
        this.y = y;
    }

    static DiabetesData load() throws IOException {
        Path data = DIR.resolve("diabetes_data_raw.csv.gz");
        Path target = DIR.resolve("diabetes_target.csv.gz");
        if (!Files.exists(data) || !Files.exists(target)) {
            throw new IllegalStateException("the diabetes data of python3-sklearn is missing under " + DIR
                    + " (apt-get install python3-sklearn; .ci/run installs it)");
        }
        List<double[]> raw = read(data);
        List<double[]> ys = read(target);
        int n = raw.size();
        int p = raw.get(0).length;
        double[][] x = new double[n][p];
        for (int j = 0; j < p; j++) {
            double mean = 0;
            for (double[] r : raw) {
                mean += r[j];
            }
            mean /= n;
            double ss = 0;
            for (double[] r : raw) {
                ss += (r[j] - mean) * (r[j] - mean);
            }
            double scale = Math.sqrt(ss / n) * Math.sqrt(n); // sklearn: scale() then / sqrt(n)
            for (int i = 0; i < n; i++) {
                x[i][j] = (raw.get(i)[j] - mean) / scale;
            }
        }
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = ys.get(i)[0];
        }
        return new DiabetesData(x, y);
    }

    private static List<double[]> read(Path gz) throws IOException {
        List<double[]> rows = new ArrayList<>();
        try (InputStream in = new GZIPInputStream(Files.newInputStream(gz));
                BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank()) {
                    continue;
                }
                String[] parts = line.trim().split("\\s+");
                double[] row = new double[parts.length];
                for (int j = 0; j < parts.length; j++) {
                    row[j] = Double.parseDouble(parts[j]);
                }
                rows.add(row);
            }
        }
        return rows;
    }

    static JsonNode references() throws IOException {
        try (InputStream in = DiabetesData.class.getResourceAsStream("fit-references.json")) {
            return new ObjectMapper().readTree(in);
        }
    }
}
