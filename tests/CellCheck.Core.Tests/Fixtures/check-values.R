# Check values for the spread-test and ANOVA tests, R 4.2.2, base stats only.
# Run from this folder: Rscript check-values.R
options(digits = 17)
gear <- read.csv("gear.csv"); ins <- read.csv("insect-sprays.csv"); pg <- read.csv("plant-growth.csv")
po <- read.csv("poisons.csv"); hw <- read.csv("hollander-wolfe.csv")
po$cell <- interaction(po$poison, po$treat)
report <- function(name, y, g) {
  cat("==", name, "\n")
  b <- bartlett.test(y, g); cat("bartlett.test", b$statistic, b$parameter, b$p.value, "\n")
  f <- fligner.test(y, g); cat("fligner.test", f$statistic, f$parameter, f$p.value, "\n")
  a <- anova(lm(y ~ factor(g))); cat("anova(lm(y ~ factor(g)))", a$`Sum Sq`, a$Df, a$`F value`[1], a$`Pr(>F)`[1], "\n")
}
report("gear", gear$diameter, gear$batch)
report("insect-sprays", ins$count, ins$spray)
report("plant-growth", pg$weight, pg$group)
report("poisons-time", po$time, po$cell)
report("poisons-rate", 1 / po$time, po$cell)
report("hollander-wolfe", hw$value, hw$group)
f <- fligner.test(c(1, 1, 1, 1, 2, 3, 2, 4, 7), rep(1:3, each = 3)); cat("zero-spread fligner.test", f$statistic, f$p.value, "\n")
y <- c(pg$weight, 5.0); g <- c(pg$group, "single"); a <- anova(lm(y ~ factor(g)))
cat("plant-growth + {5.0}", a$`Sum Sq`, a$Df, a$`F value`[1], a$`Pr(>F)`[1], "\n")
cat("NIST F tails", pf(21, 8, 180, lower.tail = FALSE), pf(201, 8, 1800, lower.tail = FALSE),
    pf(1.18046237440255, 4, 20, lower.tail = FALSE), pf(15.9467335677930, 1, 46, lower.tail = FALSE), "\n")
cat("F tails", pf(50, 3, 40, lower.tail = FALSE), pf(0.01, 3, 40, lower.tail = FALSE), pf(10, 1, 1000, lower.tail = FALSE), "\n")
cat("chi-square tails", pchisq(200, 5, lower.tail = FALSE), pchisq(0.5, 5, lower.tail = FALSE), pchisq(1000, 11, lower.tail = FALSE), "\n")
p <- c(0.01, 0.04, 0.04, 0.2, NA, 0.003, 0.5, 0.04, 0.9, 0.0001, 0.6)
print(p.adjust(p, "holm")); print(p.adjust(p, "BH"))
