# Reference values for inkgate-analysis tests from Debian's R (r-base-core, r-cran-psych, r-cran-car).
# Run from this folder: Rscript r_reference.R > r_reference.txt
suppressMessages({library(psych); library(car)})
options(digits = 15)
cat(R.version.string, "psych", as.character(packageVersion("psych")), "car", as.character(packageVersion("car")), "\n")
sf <- read.csv("shrout_fleiss_1979.csv")
icc <- psych::ICC(sf[, c("J1", "J2", "J3", "J4")], alpha = 0.05, lmer = FALSE)
r <- icc$results
for (i in seq_len(nrow(r))) cat("icc", r$type[i], "value", r$ICC[i], "lower", r[i, "lower bound"], "upper", r[i, "upper bound"], "\n")
# Fisher's exact test on an r x c table (network algorithm in R)
tab <- matrix(c(16, 3, 0, 4, 12, 5, 0, 5, 15), nrow = 3)
cat("fisher_3x3 p", fisher.test(tab)$p.value, "\n")
tab2 <- matrix(c(5, 0, 3, 1, 0, 4), nrow = 3, byrow = TRUE)
cat("fisher_3x2 [[5,0],[3,1],[0,4]] p", fisher.test(tab2)$p.value, "\n")
# Condition x group interaction in a split-plot design: warpbreaks with wool as the within factor,
# pairing the i-th wool A and i-th wool B loom within each tension (an artificial pairing of
# published data, used only to check the arithmetic); tension between.
wb <- read.csv("warpbreaks.csv")
wb$id <- factor(paste(wb$tension, ave(seq_along(wb$breaks), wb$wool, wb$tension, FUN = seq_along)))
fit <- aov(breaks ~ tension * wool + Error(id / wool), data = wb)
s <- summary(fit)[["Error: id:wool"]][[1]]
cat("splitplot_wool_x_tension F", s["tension:wool", "F value"], "df", s["tension:wool", "Df"], s["Residuals", "Df"],
    "p", s["tension:wool", "Pr(>F)"], "\n")
cat("splitplot_wool F", s["wool", "F value"], "p", s["wool", "Pr(>F)"], "\n")
# Levene / Brown-Forsythe (car)
pg <- read.csv("PlantGrowth.csv")
print(car::leveneTest(weight ~ factor(group), data = pg, center = median))
print(car::leveneTest(weight ~ factor(group), data = pg, center = mean))
