package lotgate.tables;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import lotgate.sampling.DoublePlan;
import lotgate.sampling.Plan;
import lotgate.sampling.SinglePlan;

/**
 * The published attribute sampling tables (MIL-STD-105E, 1989), read from the resource file
 * {@code lotgate/tables/attribute-tables.txt}: the sample size code letters by lot size and inspection
 * level, and the single and double plans by code letter and AQL for each severity, arrows included.
 */
public final class AttributeTables {
    private static final String RESOURCE = "/lotgate/tables/attribute-tables.txt";
    private static final AttributeTables STANDARD = load();

    /** One band of lot sizes in Table I with its code letter per inspection level. */
    public record LotBand(int from, int to, Map<InspectionLevel, Character> letters) {
    }

    /** A cell the file marks as least certain, with the reason. */
    public record Doubt(String letter, String aql, String reason) {
    }

    /**
     * One plan table: rows of code letters with their sample sizes (per stage for double plans, 0 where
     * the table has none) and one cell per AQL.
     */
    public record Grid(String name, String source, List<Character> letters, List<Integer> sampleSizes,
            List<List<String>> cells, List<Doubt> doubts) {
        public String cell(int row, int aqlIndex) {
            return cells.get(row).get(aqlIndex);
        }

        public int row(char letter) {
            return letters.indexOf(letter);
        }
    }

    private final String codeLetterSource;
    private final List<LotBand> bands;
    private final List<String> aqls;
    private final Map<String, Grid> grids;

    private AttributeTables(String codeLetterSource, List<LotBand> bands, List<String> aqls, Map<String, Grid> grids) {
        this.codeLetterSource = codeLetterSource;
        this.bands = List.copyOf(bands);
        this.aqls = List.copyOf(aqls);
        this.grids = Collections.unmodifiableMap(grids);
    }

    /** The tables shipped with lotgate. */
    public static AttributeTables standard() {
        return STANDARD;
    }

    public String codeLetterSource() {
        return codeLetterSource;
    }

    public List<LotBand> lotBands() {
        return bands;
    }

    /** The preferred AQL series as the tables print it, in percent (0.010 to 1000). */
    public List<String> aqls() {
        return aqls;
    }

    /** A plan table by name: single-normal, single-tightened, single-reduced, double-normal, double-tightened. */
    public Grid grid(TableScheme scheme, TableSeverity severity) {
        return grids.get(scheme.word() + "-" + severity.word());
    }

    public Map<String, Grid> grids() {
        return grids;
    }

    /** The sample size code letter of Table I. */
    public char codeLetter(int lotSize, InspectionLevel level) {
        if (lotSize < 2) {
            throw new IllegalArgumentException("the tables start at a lot of 2 units, got " + lotSize);
        }
        for (LotBand band : bands) {
            if (lotSize >= band.from() && (band.to() < 0 || lotSize <= band.to())) {
                return band.letters().get(level);
            }
        }
        throw new IllegalStateException("no lot size band holds " + lotSize);
    }

    /** The position of an AQL (in percent) in the preferred series, or an exception that lists the series. */
    public int aqlIndex(double percent) {
        for (int i = 0; i < aqls.size(); i++) {
            double value = Double.parseDouble(aqls.get(i));
            if (Math.abs(value - percent) <= 1e-9 * value) {
                return i;
            }
        }
        throw new IllegalArgumentException("AQL " + plain(percent) + "% is not in the tables' preferred series: "
                + String.join(", ", aqls));
    }

    /** The plan for a lot size, inspection level, AQL (index in the series), severity and scheme. */
    public TableLookup plan(int lotSize, InspectionLevel level, int aqlIndex, TableSeverity severity,
            TableScheme scheme) {
        char letter = codeLetter(lotSize, level);
        return plan(letter, lotSize, aqlIndex, severity, scheme);
    }

    /** The plan for a code letter; {@code lotSize} (0 for none) only decides whether every unit is inspected. */
    public TableLookup plan(char letter, int lotSize, int aqlIndex, TableSeverity severity, TableScheme scheme) {
        Grid grid = grid(scheme, severity);
        if (grid == null) {
            throw new IllegalArgumentException("lotgate does not hold the " + scheme.word() + " plans for "
                    + severity.word() + " inspection (not confirmed); use the single plans");
        }
        List<String> steps = new ArrayList<>();
        int row = grid.row(letter);
        if (row < 0) {
            throw new IllegalArgumentException("no code letter " + letter + " in " + grid.source());
        }
        String cell = grid.cell(row, aqlIndex);
        String aql = aqls.get(aqlIndex);
        if (cell.equals("v") || cell.equals("^")) {
            int direction = cell.equals("v") ? 1 : -1;
            int start = row;
            while (row >= 0 && row < grid.letters().size() && grid.cell(row, aqlIndex).equals(cell)) {
                row += direction;
            }
            if (row < 0 || row >= grid.letters().size() || isArrowOrEmpty(grid.cell(row, aqlIndex))) {
                throw new IllegalStateException(grid.name() + ": the arrow at " + letter + ", AQL " + aql
                        + " lands on no plan");
            }
            steps.add("the table's arrow at code letter " + grid.letters().get(start) + " and AQL " + aql + " points "
                    + (direction > 0 ? "down" : "up") + " to the first plan " + (direction > 0 ? "below" : "above")
                    + " it, at code letter " + grid.letters().get(row));
            cell = grid.cell(row, aqlIndex);
        }
        char used = grid.letters().get(row);
        if (cell.equals("*")) {
            steps.add("the double table has no plan at code letter " + used + " and AQL " + aql
                    + ": it says to use the single plan");
            TableLookup single = plan(used, lotSize, aqlIndex, severity, TableScheme.SINGLE);
            List<String> all = new ArrayList<>(steps);
            all.addAll(single.steps());
            return new TableLookup(letter, single.usedLetter(), single.plan(), TableScheme.SINGLE, all,
                    single.source(), lotSize, single.hundredPercent());
        }
        if (cell.equals("-")) {
            throw new IllegalStateException(grid.name() + ": no entry at " + letter + ", AQL " + aql);
        }
        Plan plan = parsePlan(cell, grid.sampleSizes().get(row));
        boolean all = lotSize > 0 && plan.maxSampleSize() >= lotSize;
        return new TableLookup(letter, used, plan, scheme, steps, grid.source(), lotSize, all);
    }

    private static boolean isArrowOrEmpty(String cell) {
        return cell.equals("v") || cell.equals("^") || cell.equals("-");
    }

    static Plan parsePlan(String cell, int sampleSize) {
        String[] stages = cell.split(",");
        if (stages.length == 1) {
            int[] acRe = pair(stages[0]);
            return new SinglePlan(sampleSize, acRe[0], acRe[1]);
        }
        int[] first = pair(stages[0]);
        int[] second = pair(stages[1]);
        if (second[1] != second[0] + 1) {
            throw new IllegalStateException("a double plan's second stage must decide: " + cell);
        }
        return new DoublePlan(sampleSize, first[0], first[1], sampleSize, second[0]);
    }

    private static int[] pair(String text) {
        String[] parts = text.split("/");
        return new int[] {Integer.parseInt(parts[0]), Integer.parseInt(parts[1])};
    }

    private static String plain(double value) {
        return java.math.BigDecimal.valueOf(value).stripTrailingZeros().toPlainString();
    }

    private static AttributeTables load() {
        try (InputStream in = AttributeTables.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + RESOURCE);
            }
            return parse(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)).lines().toList());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static AttributeTables parse(List<String> lines) {
        List<LotBand> bands = new ArrayList<>();
        List<String> aqls = null;
        Map<String, Grid> grids = new LinkedHashMap<>();
        String codeLetterSource = null;
        String table = null;
        String source = null;
        List<InspectionLevel> levels = new ArrayList<>();
        List<Character> letters = new ArrayList<>();
        List<Integer> sizes = new ArrayList<>();
        List<List<String>> cells = new ArrayList<>();
        List<Doubt> doubts = new ArrayList<>();
        int number = 0;
        for (String raw : lines) {
            number++;
            String line = raw.strip();
            if (line.isEmpty() || line.startsWith("#")) {
                continue;
            }
            String[] words = line.split("\\s+");
            try {
                switch (words[0]) {
                    case "table" -> {
                        table = words[1];
                        source = null;
                        letters = new ArrayList<>();
                        sizes = new ArrayList<>();
                        cells = new ArrayList<>();
                        doubts = new ArrayList<>();
                    }
                    case "source" -> source = line.substring("source".length()).strip();
                    case "levels" -> {
                        for (int i = 1; i < words.length; i++) {
                            levels.add(InspectionLevel.parse(words[i]));
                        }
                    }
                    case "lots" -> {
                        Map<InspectionLevel, Character> byLevel = new LinkedHashMap<>();
                        for (int i = 0; i < levels.size(); i++) {
                            byLevel.put(levels.get(i), words[3 + i].charAt(0));
                        }
                        bands.add(new LotBand(Integer.parseInt(words[1]),
                                words[2].equals("-") ? -1 : Integer.parseInt(words[2]), byLevel));
                    }
                    case "aql" -> {
                        List<String> series = List.of(words).subList(1, words.length);
                        if (aqls != null && !aqls.equals(series)) {
                            throw new IllegalStateException("the tables disagree on the AQL series");
                        }
                        aqls = series;
                    }
                    case "row" -> {
                        letters.add(words[1].charAt(0));
                        sizes.add(words[2].equals("-") ? 0 : Integer.parseInt(words[2]));
                        List<String> row = List.of(words).subList(3, words.length);
                        if (aqls == null || row.size() != aqls.size()) {
                            throw new IllegalStateException("a row needs one cell per AQL");
                        }
                        cells.add(List.copyOf(row));
                    }
                    case "doubt" -> doubts.add(new Doubt(words[1], words[2],
                            line.split("\\s+", 4).length > 3 ? line.split("\\s+", 4)[3] : ""));
                    case "end" -> {
                        if ("code-letters".equals(table)) {
                            codeLetterSource = source;
                        } else {
                            grids.put(table, new Grid(table, source, List.copyOf(letters), List.copyOf(sizes),
                                    List.copyOf(cells), List.copyOf(doubts)));
                        }
                        table = null;
                    }
                    default -> throw new IllegalStateException("unknown line kind '" + words[0] + "'");
                }
            } catch (RuntimeException e) {
                throw new IllegalStateException(RESOURCE + " line " + number + ": " + e.getMessage(), e);
            }
        }
        return new AttributeTables(codeLetterSource, bands, aqls, grids);
    }

    @Override
    public String toString() {
        return "attribute tables " + grids.keySet().toString().toLowerCase(Locale.ROOT);
    }
}
