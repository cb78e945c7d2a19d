# Check values for the run-order tests (Durbin-Watson, runs, trend, lag-1), R 4.2.2, base stats only.
# Run from this folder: Rscript order-check-values.R
# The Durbin-Watson probabilities are computed two independent ways, both with R's adaptive integrate():
# Imhof's (1961) integral on the u scale, and the real-axis (Pan-type) form obtained by folding the inversion
# contour onto the branch cuts. Their agreement (observed within 2e-16 for growth of money) bounds their error.
options(digits = 17)

imhof <- function(c) { # P(sum c_j z_j^2 <= 0)
  f <- function(u) sapply(u, function(v) sin(0.5 * sum(atan(c * v))) / (v * prod((1 + (c * v)^2)^0.25)))
  0.5 - integrate(f, 0, Inf, rel.tol = 1e-13, abs.tol = 1e-15, subdivisions = 5000)$value / pi
}
pan <- function(c) { # P(Q > 0) = (1/pi) sum_r (-1)^r int_{c(2r+2)}^{c(2r+1)} y^(m/2-1) prod |y - c_j|^(-1/2) dy
  m <- length(c); pos <- c(sort(c[c > 0], decreasing = TRUE), 0); kk <- length(pos) - 1; total <- 0
  for (r in 0:((kk - 1) %/% 2)) {
    U <- pos[2 * r + 1]; L <- pos[2 * r + 2]
    others <- c[-c(which(c == U)[1], if (L > 0) which(c == L)[1])]
    g <- function(th) sapply(th, function(t) { y <- (U + L) / 2 + (U - L) / 2 * cos(t)
      y^(m / 2 - 1) * prod(abs(y - others)^(-0.5)) * (if (L == 0) sqrt(y) else 1) })
    total <- total + (-1)^r * integrate(g, 0, pi, rel.tol = 1e-13, subdivisions = 5000)$value
  }
  1 - total / pi
}
eig <- function(X, n = nrow(X)) { # eigenvalues of MAM on the range of M
  A <- diag(c(1, rep(2, n - 2), 1)); A[abs(row(A) - col(A)) == 1] <- -1
  M <- if (ncol(X) == 0) diag(n) else diag(n) - X %*% solve(crossprod(X), t(X))
  ev <- sort(eigen(M %*% A %*% M, symmetric = TRUE)$values)
  if (ncol(X) == 0) ev else ev[-seq_len(ncol(X))] }
moments <- function(lam) { m <- length(lam); c(mean = mean(lam), var = 2 * (m * sum(lam^2) - sum(lam)^2) / (m^2 * (m + 2))) }

cat("== growth of money\n")
gm <- read.csv("growth-of-money.csv", check.names = FALSE)
X <- cbind(1, gm[["AG0.TG0"]]); e <- residuals(lm(gm[["TG1.TG0"]] ~ gm[["AG0.TG0"]]))
d <- sum(diff(e)^2) / sum(e^2); lam <- eig(X); mv <- moments(lam)
cat("d", d, "imhof", imhof(lam - d), "pan", pan(lam - d), "E", mv[1], "Var", mv[2], "normal", pnorm(d, mv[1], sqrt(mv[2])), "\n")

cat("== 2^4 factorial, run r = 0..15 holds standard-order row (7 r + 3) mod 16, columns 1 A B C D\n")
s <- (7 * (0:15) + 3) %% 16
X <- cbind(1, sapply(0:3, function(f) ifelse(bitwAnd(s, 2^f) > 0, 1, -1)))
lam <- eig(X); cat("E Var", moments(lam), "\n")
for (d0 in c(1.5, 2.0, 2.5, 3.0)) cat("d0", d0, "imhof", imhof(lam - d0), "pan", pan(lam - d0), "\n")

cat("== statsmodels 20 values taken as residuals of an empty model (M = I)\n")
e20 <- c(-0.1184, -1.3403, 0.0063, -0.612, -0.3869, -0.2313, -2.8485, -0.2167, 0.4153, 1.8492,
         -0.3706, 0.9726, -0.1501, -0.0337, -1.4423, 1.2489, 0.9182, -0.2331, -0.6182, 0.183)
d <- sum(diff(e20)^2) / sum(e20^2); lam <- eig(matrix(0, 20, 0))
cat("d", d, "imhof", imhof(lam - d), "pan", pan(lam - d), "E Var", moments(lam), "\n")

cat("== n = 400: intercept and indicators of blocks 2-4 of 100 consecutive runs\n")
b <- rep(1:4, each = 100); X <- cbind(1, sapply(2:4, function(j) as.numeric(b == j)))
lam <- eig(X); mv <- moments(lam); cat("E Var", mv, "\n")
for (d0 in c(1.8, 1.9, 2.0, 2.1)) cat("d0", d0, "imhof", imhof(lam - d0), "normal", pnorm(d0, mv[1], sqrt(mv[2])), "\n")

cat("== runs about the median, earth density\n")
ed <- read.csv("earth-density.csv")$density
med <- median(ed); keep <- ed[ed != med]; above <- keep > med; n <- length(keep); n2 <- sum(above)
runs <- 1 + sum(above[-1] != above[-n])
pos <- combn(n, n2) # brute force: every placement of the 'above' signs, equally likely under the null
a <- matrix(FALSE, n, ncol(pos)); a[cbind(as.vector(pos), rep(seq_len(ncol(pos)), each = n2))] <- TRUE
r <- 1 + colSums(a[-1, ] != a[-n, ])
cat("n1", n - n2, "n2", n2, "runs", runs, "exact two-sided", min(1, 2 * min(mean(r <= runs), mean(r >= runs))), "\n")
print(table(r))

cat("== trend and lag-1 on the statsmodels 20 values\n")
t <- 1:20; print(summary(lm(e20 ~ t))$coefficients)
tt <- (1:20)^1.5; print(summary(lm(e20 ~ tt))$coefficients)
cat("lag1", sum(e20[-1] * e20[-20]) / sum(e20^2), "\n")
