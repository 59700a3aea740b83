# Reference for the rater x task interaction estimated jointly with the main effects (Inkgate
# issue 18, part 1). Simulates invented ratings (set.seed below; not exam data) from a rating-scale
# many-facet model with one planted interaction: rater r2 is 0.6 logit more lenient on task t1.
# 120 candidates, 3 tasks, 4 raters; each candidate rated by 2 raters on every task, scores 0-3.
# For each rater x task combination the same fixed-effects adjacent-category likelihood is fitted
# as a conditional logit (survival::clogit, one stratum per rating, one row per category) with the
# main effects (candidates free, tasks and raters centred, thresholds summing to 0) plus that
# combination's own term k * [rater = r and task = t]: its coefficient is the interaction size
# (positive = the combination scores higher than the main effects expect) and its SE comes from the
# full covariance. Run from this folder:
#   Rscript mfrm_clogit_interaction.R > mfrm_clogit_interaction.txt
suppressPackageStartupMessages(library(survival))
set.seed(20261218)
nc <- 120; tasks <- paste0("t", 1:3); raters <- paste0("r", 1:4); m <- 3
B <- rnorm(nc, 0, 1.2); D <- c(-0.4, 0.1, 0.3); C <- c(-0.5, -0.1, 0.2, 0.4); F <- c(-1.2, 0.1, 1.1)
pairs <- list(c(1, 2), c(2, 3), c(3, 4), c(4, 1), c(1, 3), c(2, 4))
rows <- list()
for (n in seq_len(nc)) {
  for (r in pairs[[(n - 1) %% 6 + 1]]) for (t in 1:3) {
    eta <- B[n] - D[t] - C[r] + ifelse(r == 2 && t == 1, 0.6, 0)
    p <- exp(cumsum(c(0, eta - F))); p <- p / sum(p)
    rows[[length(rows) + 1]] <- data.frame(candidate = sprintf("c%03d", n), task = tasks[t], rater = raters[r],
                                           score = sample(0:m, 1, prob = p))
  }
}
d <- do.call(rbind, rows)
write.csv(d, "mfrm_interaction_ratings.csv", row.names = FALSE, quote = FALSE)
d$candidate <- factor(d$candidate); d$task <- factor(d$task); d$rater <- factor(d$rater)
centred <- function(J) rbind(diag(J - 1), rep(-1, J - 1))
Lt <- centred(3); Lr <- centred(4); Lf <- centred(m)
x <- d[rep(seq_len(nrow(d)), each = m + 1), ]
x$k <- rep(0:m, times = nrow(d)); x$stratum <- rep(seq_len(nrow(d)), each = m + 1)
x$event <- as.integer(x$k == x$score)
X_c <- matrix(0, nrow(x), nlevels(d$candidate)); X_c[cbind(seq_len(nrow(x)), as.integer(x$candidate))] <- x$k
X_t <- -x$k * Lt[as.integer(x$task), ]; X_r <- -x$k * Lr[as.integer(x$rater), ]
X_f <- -rbind(0, apply(Lf, 2, cumsum))[x$k + 1, ]
X <- cbind(X_c, X_t, X_r, X_f)
out <- NULL
for (t in tasks) for (r in raters) {
  cell <- x$k * (x$task == t & x$rater == r)
  if (sum(d$task == t & d$rater == r) == 0) next
  fit <- clogit(x$event ~ X + cell + strata(x$stratum), control = coxph.control(eps = 1e-10, iter.max = 100))
  out <- rbind(out, data.frame(rater = r, task = t, ratings = sum(d$task == t & d$rater == r),
                               size = unname(coef(fit)["cell"]), se = unname(sqrt(vcov(fit)["cell", "cell"]))))
}
write.csv(out, "mfrm_clogit_interaction.csv", row.names = FALSE, quote = FALSE)
print(R.version.string); print(paste("survival", packageVersion("survival")))
print(out, digits = 12)
