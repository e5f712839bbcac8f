import java.nio.file.*; import java.util.*; import org.treeproof.data.*;
/**
 * Which features {@code org.treeproof.data.MultimodalFeatures} flags in each CSV given (options from a {@code .opts} file
 * beside it: {@code --samples-in-columns}, {@code --log2}); the dip does not change under scaling, so the raw columns
 * are tested. Prints n, p, the features tested, the features flagged (dip, p-value) and whether the note would be
 * left out because every feature is flagged. Run by run.sh.
 */
public class MultimodalNoteCheck {
  public static void main(String[] a) throws Exception {
    for (String path : a) {
      List<String> lines = Files.readAllLines(Path.of(path));
      String opts = Files.exists(Path.of(path.replace(".csv", ".opts"))) ? Files.readString(Path.of(path.replace(".csv", ".opts"))) : "";
      String[] head = lines.get(0).split(",");
      int rows = lines.size() - 1, cols = head.length - 1;
      double[][] x = new double[rows][cols];
      List<String> rid = new ArrayList<>();
      for (int i = 0; i < rows; i++) { String[] f = lines.get(i + 1).split(","); rid.add(f[0]); for (int j = 0; j < cols; j++) x[i][j] = f[j+1].isEmpty() ? 0 : Double.parseDouble(f[j + 1]); }
      boolean t = opts.contains("--samples-in-columns"); boolean lg = opts.contains("--log2");
      int n = t ? cols : rows, p = t ? rows : cols;
      double[] v = new double[n * p]; List<String> ids = new ArrayList<>(), names = new ArrayList<>();
      for (int i = 0; i < n; i++) ids.add("s" + i); for (int j = 0; j < p; j++) names.add(t ? rid.get(j) : head[j + 1]);
      for (int i = 0; i < n; i++) for (int j = 0; j < p; j++) { double y = t ? x[j][i] : x[i][j]; v[i * p + j] = lg ? Math.log(y + 1) : y; }
      var r = MultimodalFeatures.of(new DataMatrix(ids, names, v));
      StringBuilder sb = new StringBuilder();
      for (int k = 0; k < Math.min(4, r.flags().size()); k++) { var f = r.flags().get(k); sb.append(String.format(Locale.ROOT, "%s %.3f %.1e; ", f.feature(), f.test().dip(), f.test().pValue())); }
      System.out.printf(Locale.ROOT, "%-36s n=%5d p=%5d tested=%5d flagged=%4d %s%s%n", Path.of(path).getFileName(), n, p, r.tested(), r.flags().size(), sb, r.flags().size() == p && p > 0 ? " (all: no note)" : "");
    }
  }
}
