# Reference checks for the speed benchmark, written with R stats + data.table only.
# Usage: Rscript bench/reference/check.R FILE.csv   (a screen-*.csv written by CellCheck.Benchmarks generate)
#
# It computes the core of what `cellcheck check` reports for the benchmark design, and no more:
#   - residuals from the cell-means model (signal minus the mean of its head x reagent_lot x dose cell).
#     The design's day block is ignored here, so this script is doing less work than CellCheck, which
#     builds the block into its residuals and also runs run-order, model and calibration checks;
#   - Shapiro-Wilk per cell (cells with 3..5000 values), counted at p < 0.05;
#   - Levene (absolute deviations from the cell mean), Brown-Forsythe (from the cell median) and Bartlett
#     across the cells with at least two values;
#   - a pooled Shapiro-Wilk on the residuals.

suppressPackageStartupMessages(library(data.table))

args <- commandArgs(trailingOnly = TRUE)
if (length(args) != 1L) stop("usage: Rscript check.R FILE.csv")
dt <- fread(args[1L], select = c("seq", "head", "reagent_lot", "dose", "signal"))

# Cell number and cell-means residual, in one grouped pass.
dt[, c("cell", "resid") := .(.GRP, signal - mean(signal)), by = .(head, reagent_lot, dose)]
dt[, n := .N, by = cell]

# Shapiro-Wilk p for one cell; NA where shapiro.test would refuse (outside 3..5000 values, or no spread).
sw_p <- function(x) {
  if (length(x) < 3L || length(x) > 5000L || diff(range(x)) < 1e-10) return(NA_real_)
  shapiro.test(x)$p.value
}
cells <- dt[, .(p = sw_p(resid)), by = cell]

# One-way ANOVA F of z across groups g, from grouped sums (no loop over cells): returns F, df and p.
oneway_f <- function(z, g) {
  s <- data.table(z, g)[, .(n = .N, m = mean(z), ss = sum((z - mean(z))^2)), by = g]
  k <- nrow(s)
  N <- sum(s$n)
  grand <- sum(s$n * s$m) / N
  f <- (sum(s$n * (s$m - grand)^2) / (k - 1)) / (sum(s$ss) / (N - k))
  list(stat = f, df = sprintf("%d, %d", k - 1L, N - k), p = pf(f, k - 1, N - k, lower.tail = FALSE))
}

# Spread tests: cells with at least two values (a single value has no spread; bartlett.test refuses it).
spread <- dt[n >= 2L]
levene <- oneway_f(abs(spread$resid), spread$cell)                        # resid is already mean-centred
spread[, bf := abs(resid - median(resid)), by = cell]
brown_forsythe <- oneway_f(spread$bf, spread$cell)
b <- bartlett.test(spread$resid, spread$cell)

# Pooled Shapiro-Wilk: R's shapiro.test refuses more than 5000 values, so it takes the first 5000 residuals
# in run order (seq). The other tools use all residuals; this number is therefore not comparable above 5000 rows.
first <- dt[order(seq), resid][seq_len(min(nrow(dt), 5000L))]
pooled <- shapiro.test(first)

cat(sprintf("rows %d, cells %d\n", nrow(dt), nrow(cells)))
cat(sprintf("per-cell Shapiro-Wilk: %d cells tested, %d with p < 0.05\n",
            sum(!is.na(cells$p)), sum(cells$p < 0.05, na.rm = TRUE)))
cat(sprintf("Levene (mean):          F = %.6g  df = %s  p = %.6g\n", levene$stat, levene$df, levene$p))
cat(sprintf("Brown-Forsythe (median): F = %.6g  df = %s  p = %.6g\n",
            brown_forsythe$stat, brown_forsythe$df, brown_forsythe$p))
cat(sprintf("Bartlett:               K2 = %.6g  df = %d  p = %.6g\n", b$statistic, as.integer(b$parameter), b$p.value))
cat(sprintf("pooled Shapiro-Wilk (first %d residuals in run order; R's limit is 5000): W = %.6g  p = %.6g\n",
            length(first), pooled$statistic, pooled$p.value))
