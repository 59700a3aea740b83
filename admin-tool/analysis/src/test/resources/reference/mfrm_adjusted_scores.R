# Reference adjusted scores (Inkgate issue 18, part 2): the model-expected raw score of one rating
# with every other facet at its mean, computed in R from the VGAM reference fits of
# ../mfrm/reference (reference.R: rating scale; reference-pcm.R: partial credit by task) on
# ratingscale-2000.csv, scores 0-4. Adjacent-category model: P(k) proportional to
# exp(sum_{j<=k} (eta - F_j)); expected score = sum k P(k). Candidates: eta = B_n - mean(D) - mean(C);
# task t: mean(B) - D_t - mean(C); rater r: mean(B) - mean(D) - C_r. Partial credit: each task's
# own thresholds for the task's score; candidates and raters averaged over the four tasks' scores.
# Run from this folder:  Rscript mfrm_adjusted_scores.R > mfrm_adjusted_scores.txt
expected <- function(eta, F) { p <- exp(cumsum(c(0, eta - F))); p <- p / sum(p); sum((seq_along(p) - 1) * p) }
out <- NULL
for (structure in c("rating_scale", "partial_credit_task")) {
  file <- if (structure == "rating_scale") "ratingscale-2000-vgam.csv" else "ratingscale-2000-pcm-vgam.csv"
  r <- read.csv(file.path("../mfrm/reference", file), stringsAsFactors = FALSE)
  get <- function(f) { x <- r[r$facet == f, ]; setNames(x$measure, x$element) }
  B <- get("candidate"); D <- get("task"); C <- get("rater"); Th <- get("threshold")
  thr <- function(t) if (structure == "rating_scale") Th[paste0("F", 1:4)] else Th[paste0(t, ":F", 1:4)]
  score <- function(eta, t = NULL) {
    if (structure == "rating_scale") return(expected(eta, thr(NULL)))
    if (!is.null(t)) return(expected(eta, thr(t)))
    mean(sapply(names(D), function(tt) expected(eta, thr(tt))))
  }
  out <- rbind(out,
    data.frame(structure = structure, facet = "candidate", element = names(B),
               adjusted = sapply(B, function(b) score(b - mean(D) - mean(C)))),
    data.frame(structure = structure, facet = "task", element = names(D),
               adjusted = sapply(names(D), function(t) score(mean(B) - D[t] - mean(C), t))),
    data.frame(structure = structure, facet = "rater", element = names(C),
               adjusted = sapply(C, function(cr) score(mean(B) - mean(D) - cr))))
}
write.csv(out, "mfrm_adjusted_scores.csv", row.names = FALSE, quote = FALSE)
print(R.version.string)
print(out[out$facet != "candidate", ], digits = 12)
