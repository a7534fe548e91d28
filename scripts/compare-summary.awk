# Summary table of scripts/benchmarks.sh compare: input lines "benchmark side round score".
      { v[$1 " " $2] = v[$1 " " $2] " " $4; key[$1] = 1 }
      function stats(list, out,   a, n, i, j, t, s, ss) {
        n = split(list, a, " ")
        for (i = 1; i <= n; i++) for (j = i + 1; j <= n; j++) if (a[j] < a[i]) { t = a[i]; a[i] = a[j]; a[j] = t }
        for (i = 1; i <= n; i++) { s += a[i]; ss += a[i] * a[i] }
        out["median"] = (n % 2) ? a[(n + 1) / 2] : (a[n / 2] + a[n / 2 + 1]) / 2
        out["mean"] = s / n; out["sd"] = n > 1 ? sqrt((ss - s * s / n) / (n - 1)) : 0; out["n"] = n
      }
      END {
        printf "| benchmark (ns) | %s: median | mean +- sd | %s: median | mean +- sd | now / before (medians) | now - before (means) +- 2 standard errors | forks per side |\n", rev, now
        print "|---|---|---|---|---|---|---|---|"
        stats(v["FloorBenchmark.keplerianTerms before"], fb); stats(v["FloorBenchmark.keplerianTerms now"], fn)
        for (k in key) {
          stats(v[k " before"], b); stats(v[k " now"], n)
          se = sqrt(b["sd"] * b["sd"] / b["n"] + n["sd"] * n["sd"] / n["n"])
          printf "| %s | %.2f | %.2f +- %.2f | %.2f | %.2f +- %.2f | %.3f | %.2f +- %.2f | %d |\n", k, b["median"], b["mean"], b["sd"], n["median"], n["mean"], n["sd"], n["median"] / b["median"], n["mean"] - b["mean"], 2 * se, n["n"]
        }
        printf "\nratio to the floor (medians): "
        for (k in key) if (k != "FloorBenchmark.keplerianTerms") { stats(v[k " before"], b); stats(v[k " now"], n); printf "%s %.2f -> %.2f; ", k, b["median"] / fb["median"], n["median"] / fn["median"] }
        print ""
      }
