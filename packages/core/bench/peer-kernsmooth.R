# Peer timing for the density benchmark: R KernSmooth::bkde2D (binned Gaussian KDE, FFT).
# Usage: Rscript peer-kernsmooth.R POINTS N BANDWIDTH WIDTH HEIGHT MINX MINY MAXX MAXY
# POINTS: float64 little-endian x[N], y[N], w[N]. bkde2D takes no weights, so the weights are
# ignored (the timing is what matters; the row says so). The grid nodes are the cell centres.
# Prints one JSON line: the fastest of 3 runs, timed around bkde2D only (reading the file excluded).
suppressPackageStartupMessages(library(KernSmooth))
a <- commandArgs(trailingOnly = TRUE)
n <- as.integer(a[2])
h <- as.numeric(a[3])
gw <- as.integer(a[4]); gh <- as.integer(a[5])
ext <- as.numeric(a[6:9])
con <- file(a[1], "rb")
raw <- readBin(con, "double", n = 3 * n, size = 8, endian = "little")
close(con)
xy <- cbind(raw[1:n], raw[(n + 1):(2 * n)])
best <- Inf
best_cpu <- Inf
for (k in 1:3) {
  t <- system.time(est <- bkde2D(xy, bandwidth = c(h, h), gridsize = c(gw, gh),
                                 range.x = list(c(ext[1], ext[3]), c(ext[2], ext[4]))))
  if (t[["elapsed"]] < best) best_cpu <- t[["user.self"]] + t[["sys.self"]]
  best <- min(best, t[["elapsed"]])
}
cat(sprintf('{"label":"R %s KernSmooth %s bkde2D (Gaussian, unweighted)","seconds":%.6f,"cpuSeconds":%.6f,"max":%.10g}\n',
            paste(R.version$major, R.version$minor, sep = "."), packageVersion("KernSmooth"),
            best, best_cpu, max(est$fhat) * n * 1e6))
