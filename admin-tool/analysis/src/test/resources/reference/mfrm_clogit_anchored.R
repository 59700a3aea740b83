# Reference for an anchored run (Inkgate issue 18, part 2): the committed simulated set
# ../mfrm/reference/ratingscale-2000.csv (candidate, task, rater, score 0-4) with the task measures
# and the rating-scale thresholds fixed at the values below (invented anchors, as an earlier
# sitting might have given; written as an anchor file, mfrm_anchors.csv, in the format of
# docs/analysis.md), fitted as a conditional logit (survival::clogit, one stratum per rating, one
# row per category) with the anchored part as an offset: k (B_n - D_task - C_rater) - (F_1 + ... + F_k).
# Free: candidates, and raters centred (their facet has no anchor). Also each anchored task's
# displacement at the fitted values: (expected - observed score) / information, the logit change
# of the task measure the data ask for (one Newton step; positive = the task was harder here).
# Run from this folder:  Rscript mfrm_clogit_anchored.R > mfrm_clogit_anchored.txt
suppressPackageStartupMessages(library(survival))
d <- read.csv("../mfrm/reference/ratingscale-2000.csv", stringsAsFactors = TRUE)
task_anchor <- c(t1 = -0.9, t2 = -0.3, t3 = 0.3, t4 = 1.0)
F_anchor <- c(-1.5, -0.5, 0.5, 1.5)
m <- 4
anchors <- rbind(
  data.frame(kind = "element", facet = "task", element = names(task_anchor), step = "", score = "",
             measure = unname(task_anchor)),
  data.frame(kind = "threshold", facet = "", element = "all", step = 1:m, score = 1:m, measure = F_anchor))
write.csv(anchors, "mfrm_anchors.csv", row.names = FALSE, quote = FALSE)
cand <- levels(d$candidate); raters <- levels(d$rater); nc <- length(cand); nr <- length(raters)
Lr <- rbind(diag(nr - 1), rep(-1, nr - 1))
x <- d[rep(seq_len(nrow(d)), each = m + 1), ]
x$k <- rep(0:m, times = nrow(d)); x$stratum <- rep(seq_len(nrow(d)), each = m + 1)
x$event <- as.integer(x$k == x$score)
X_c <- matrix(0, nrow(x), nc); X_c[cbind(seq_len(nrow(x)), as.integer(x$candidate))] <- x$k
X_r <- -x$k * Lr[as.integer(x$rater), ]
off <- -x$k * task_anchor[as.character(x$task)] - c(0, cumsum(F_anchor))[x$k + 1]
X <- cbind(X_c, X_r)
fit <- clogit(x$event ~ X + offset(off) + strata(x$stratum), control = coxph.control(eps = 1e-10, iter.max = 100))
th <- coef(fit); stopifnot(!any(is.na(th)))
B <- th[1:nc]; C <- drop(Lr %*% th[(nc + 1):(nc + nr - 1)])
# probabilities per rating at the fit, then each task's observed and expected score and information
eta <- B[as.integer(d$candidate)] - task_anchor[as.character(d$task)] - C[as.integer(d$rater)]
P <- t(sapply(eta, function(e) { p <- exp(c(0, cumsum(e - F_anchor))); p / sum(p) }))
E <- drop(P %*% (0:m)); V <- drop(P %*% (0:m)^2) - E^2
obs <- tapply(d$score, d$task, sum); ex <- tapply(E, d$task, sum); info <- tapply(V, d$task, sum)
out <- rbind(
  data.frame(facet = "candidate", element = cand, measure = unname(B)),
  data.frame(facet = "rater", element = raters, measure = C),
  data.frame(facet = "displacement", element = names(obs), measure = unname((ex - obs) / info)))
write.csv(out, "mfrm_clogit_anchored.csv", row.names = FALSE, quote = FALSE)
print(R.version.string); print(paste("survival", packageVersion("survival")))
print(out[out$facet != "candidate", ], digits = 12); print(summary(B))
