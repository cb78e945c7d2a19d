# Check values for the transformation remedies (Box-Cox, Yeo-Johnson, spread versus level), R 4.2.2 with MASS
# 7.3-58.2 (a recommended package shipped with R). Run from this folder: Rscript remedy-check-values.R
options(digits = 17)
library(MASS)
po <- read.csv("poisons.csv"); po$poison <- factor(po$poison); po$treat <- factor(po$treat)
profile <- function(f, range = c(-3, 3)) {
  o <- optimize(f, range, maximum = TRUE, tol = 1e-12)
  cut <- o$objective - qchisq(0.95, 1) / 2
  c(lambda = o$maximum, loglik = o$objective,
    lower = uniroot(function(l) f(l) - cut, c(range[1], o$maximum), tol = 1e-14)$root,
    upper = uniroot(function(l) f(l) - cut, c(o$maximum, range[2]), tol = 1e-14)$root)
}
# Box-Cox on the MASS scale (response divided by its geometric mean, so the Jacobian term vanishes)
additive <- lm(time ~ poison + treat, po, y = TRUE, qr = TRUE)
full <- lm(time ~ poison * treat, po, y = TRUE, qr = TRUE)
cat("additive", profile(function(l) boxcox(additive, lambda = l, plotit = FALSE)$y), "\n")
cat("full", profile(function(l) boxcox(full, lambda = l, plotit = FALSE)$y), "\n")
cat("additive at 0, 1, -1, 0.5", boxcox(additive, lambda = c(0, 1, -1, 0.5), plotit = FALSE)$y, "\n")
# spread versus level over the 12 cells: slope of log SD on log mean, for time and 1/time
cell <- interaction(po$poison, po$treat); m <- tapply(po$time, cell, mean)
sl <- lm(log(tapply(po$time, cell, sd)) ~ log(m))
cat("slope time", coef(sl)[2], "se", summary(sl)$coefficients[2, 2], "power interval", rev(1 - confint(sl)[2, ]), "\n")
cat("slope 1/time on log mean(time)", coef(lm(log(tapply(1 / po$time, cell, sd)) ~ log(m)))[2], "\n")
# Yeo-Johnson profile likelihood written out from Yeo & Johnson (2000), one-way model on InsectSprays (zero counts)
ins <- read.csv("insect-sprays.csv")
yj <- function(y, l) ifelse(y >= 0, if (l == 0) log1p(y) else ((y + 1)^l - 1) / l,
                            if (l == 2) -log1p(-y) else -((1 - y)^(2 - l) - 1) / (2 - l))
ll <- function(l) { t <- yj(ins$count, l); r <- residuals(lm(t ~ ins$spray)); n <- length(t)
  -n / 2 * log(sum(r^2) / n) + (l - 1) * sum(sign(ins$count) * log1p(abs(ins$count))) }
cat("yeo-johnson insect sprays", profile(ll), "\n")
cat("yeo-johnson insect sprays at 0, 0.5, 1", ll(0), ll(0.5), ll(1), "\n")
