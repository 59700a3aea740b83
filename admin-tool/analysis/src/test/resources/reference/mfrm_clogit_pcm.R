# Reference for the joint SEs under partial credit by a modelled facet (Inkgate issue 18, part 1).
# The committed simulated set ../mfrm/reference/ratingscale-2000.csv (candidate, task, rater,
# score 0-4; written by ../mfrm/reference/reference.R) is fitted with one threshold set per task
# as a conditional logit (R's survival::clogit): each rating becomes one row per category k with
# the adjacent-category linear predictor k (B_n - D_task - C_rater) - (F_task,1 + ... + F_task,k),
# one stratum per rating, the observed category as the event. That is the fixed-effects
# adjacent-category likelihood the joint maximum likelihood estimator maximises.
# Parametrisation as reported: tasks centred, raters centred, each task's thresholds summing to 0,
# candidates free (coded with the same contrast matrices); the SEs of every element and threshold
# come from vcov() through the contrast matrices. Run from this folder:
#   Rscript mfrm_clogit_pcm.R > mfrm_clogit_pcm.txt
suppressPackageStartupMessages(library(survival))
d <- read.csv("../mfrm/reference/ratingscale-2000.csv", stringsAsFactors = TRUE)
cand <- levels(d$candidate); tasks <- levels(d$task); raters <- levels(d$rater)
m <- max(d$score); nt <- length(tasks); nr <- length(raters); nc <- length(cand)
# sum-to-zero codings: element e of a centred facet of J elements = L[e, ] %*% theta
centred <- function(J) rbind(diag(J - 1), rep(-1, J - 1))
Lt <- centred(nt); Lr <- centred(nr); Lf <- centred(m)
rows <- d[rep(seq_len(nrow(d)), each = m + 1), ]
rows$k <- rep(0:m, times = nrow(d)); rows$stratum <- rep(seq_len(nrow(d)), each = m + 1)
rows$event <- as.integer(rows$k == rows$score)
ci <- as.integer(rows$candidate); ti <- as.integer(rows$task); ri <- as.integer(rows$rater)
X_c <- matrix(0, nrow(rows), nc); X_c[cbind(seq_len(nrow(rows)), ci)] <- rows$k
X_t <- -rows$k * Lt[ti, , drop = FALSE]
X_r <- -rows$k * Lr[ri, , drop = FALSE]
# threshold part: -(F_t,1 + ... + F_t,k) with F_t = Lf %*% phi_t; cumulative rows of Lf
cumLf <- rbind(0, apply(Lf, 2, cumsum))
X_f <- matrix(0, nrow(rows), nt * (m - 1))
for (t in seq_len(nt)) {
  sel <- ti == t
  X_f[sel, ((t - 1) * (m - 1) + 1):(t * (m - 1))] <- -cumLf[rows$k[sel] + 1, , drop = FALSE]
}
X <- cbind(X_c, X_t, X_r, X_f)
colnames(X) <- c(paste0("c", seq_len(nc)), paste0("t", seq_len(nt - 1)), paste0("r", seq_len(nr - 1)),
                 paste0("f", seq_len(nt * (m - 1))))
fit <- clogit(rows$event ~ X + strata(rows$stratum), method = "exact",
              control = coxph.control(eps = 1e-10, iter.max = 100))
theta <- coef(fit); V <- vcov(fit)
stopifnot(!any(is.na(theta)))
idx <- function(prefix) grep(paste0("^X", prefix, "[0-9]+$"), names(theta))
est_se <- function(L, cols) list(est = drop(L %*% theta[cols]), se = sqrt(diag(L %*% V[cols, cols] %*% t(L))))
task <- est_se(Lt, idx("t")); rater <- est_se(Lr, idx("r"))
out <- rbind(
  data.frame(facet = "task", element = tasks, measure = task$est, se = task$se),
  data.frame(facet = "rater", element = raters, measure = rater$est, se = rater$se))
fc <- idx("f")
for (t in seq_len(nt)) {
  th <- est_se(Lf, fc[((t - 1) * (m - 1) + 1):(t * (m - 1))])
  out <- rbind(out, data.frame(facet = "threshold", element = paste0(tasks[t], ":F", 1:m), measure = th$est, se = th$se))
}
# separation of the tasks with these SEs (Wright & Masters 1982, ch. 5): population SD, RMSE,
# true SD = sqrt(SD^2 - RMSE^2), G = true SD / RMSE, reliability G^2 / (1 + G^2)
sep <- function(x, se) {
  sd_p <- sqrt(mean((x - mean(x))^2)); rmse <- sqrt(mean(se^2)); true <- sqrt(max(sd_p^2 - rmse^2, 0))
  c(rmse = rmse, separation = true / rmse, reliability = true^2 / (true^2 + rmse^2))
}
s <- sep(task$est, task$se)
out <- rbind(out, data.frame(facet = "task_summary", element = names(s), measure = unname(s), se = NA))
write.csv(out, "mfrm_clogit_pcm.csv", row.names = FALSE, quote = FALSE)
print(R.version.string); print(paste("survival", packageVersion("survival")))
print(out, digits = 12)
