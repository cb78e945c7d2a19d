# Check values for the linear-fit case diagnostics, R 4.2.2, base stats only.
# Run from this folder: Rscript lm-diagnostics.R   (writes lm-diagnostics-poisons.csv)
# Model time ~ factor(poison) + treat with treatment contrasts, on all 48 rows ("all", balanced: every
# leverage is 6/48) and without rows 1, 6, 11, 20 and 33 ("unbalanced", leverages differ).
po <- read.csv("poisons.csv")
one <- function(set, d) {
  m <- lm(time ~ factor(poison) + treat, data = d)
  data.frame(set = set, row = as.integer(rownames(d)), hat = hatvalues(m), rstandard = rstandard(m),
             rstudent = rstudent(m), cooks = cooks.distance(m), sigma = sigma(m),
             fitted = fitted(m), residual = residuals(m))
}
out <- rbind(one("all", po), one("unbalanced", po[-c(1, 6, 11, 20, 33), ]))
num <- vapply(out, is.numeric, TRUE) & names(out) != "row"
out[num] <- lapply(out[num], function(v) sprintf("%.17g", v))
write.csv(out, "lm-diagnostics-poisons.csv", row.names = FALSE, quote = FALSE)
