# Reference values for the candidate-attribute comparisons (AttributesSectionTest) from Debian's R
# (r-base-core, r-cran-car). Run from this folder: Rscript r_attributes.R > r_attributes.txt
# Data: ToothGrowth (Crampton 1947, R datasets), read as an invented study design only to check
# the arithmetic: the i-th guinea pig of each dose under OJ and under VC is one "candidate" whose
# two conditions are OJ and VC, and dose (0.5, 1, 2: numbers used as group names) is the
# candidate's categorical attribute. Doses keep the first 10, 8 and 6 pairs, so groups are unequal.
suppressMessages(library(car))
options(digits = 15)
cat(R.version.string, "car", as.character(packageVersion("car")), "\n")
tg <- read.csv("ToothGrowth.csv")
tg$pair <- ave(seq_along(tg$len), tg$supp, tg$dose, FUN = seq_along)
keep <- c("0.5" = 10, "1" = 8, "2" = 6)
tg <- tg[tg$pair <= keep[as.character(tg$dose)], ]
tg$dose <- factor(tg$dose)
for (cond in c("OJ", "VC")) {
  d <- tg[tg$supp == cond, ]
  for (g in levels(d$dose)) {
    x <- d$len[d$dose == g]
    cat("group", cond, g, "n", length(x), "mean", mean(x), "sd", sd(x), "\n")
  }
  a <- summary(aov(len ~ dose, data = d))[[1]]
  cat("anova", cond, "F", a[1, "F value"], "df", a[1, "Df"], a[2, "Df"], "p", a[1, "Pr(>F)"],
      "eta2", a[1, "Sum Sq"] / sum(a[, "Sum Sq"]), "\n")
  w <- oneway.test(len ~ dose, data = d, var.equal = FALSE)
  cat("welch", cond, "F", w$statistic, "df2", w$parameter[2], "p", w$p.value, "\n")
  bf <- car::leveneTest(len ~ dose, data = d, center = median)
  cat("brown_forsythe", cond, "F", bf[1, "F value"], "p", bf[1, "Pr(>F)"], "\n")
  tk <- TukeyHSD(aov(len ~ dose, data = d), conf.level = 0.95)$dose
  for (i in seq_len(nrow(tk))) {
    cat("tukey", cond, rownames(tk)[i], "diff", tk[i, "diff"], "lwr", tk[i, "lwr"], "upr", tk[i, "upr"],
        "p", tk[i, "p adj"], "\n")
  }
}
# condition x attribute interaction: one-way ANOVA of each candidate's VC - OJ difference across doses
oj <- tg[tg$supp == "OJ", ]
vc <- tg[tg$supp == "VC", ]
oj <- oj[order(oj$dose, oj$pair), ]
vc <- vc[order(vc$dose, vc$pair), ]
diff <- data.frame(d = vc$len - oj$len, dose = oj$dose)
ia <- summary(aov(d ~ dose, data = diff))[[1]]
cat("interaction F", ia[1, "F value"], "df", ia[1, "Df"], ia[2, "Df"], "p", ia[1, "Pr(>F)"], "\n")
