# Reference values for the design-following analyses (issue 20 section 2) from Debian's R
# (r-base-core; car from r-cran-car). Run from this folder: Rscript design_analyses.R > design_analyses.txt
# Data: R's own published data sets (ToothGrowth, warpbreaks, as CSV beside this script) and the
# example of ?wilcox.test (Hollander & Wolfe 1973, p. 69). The within-candidate pairing of warpbreaks
# is artificial (the i-th loom of each tension taken as one "candidate"), used only to check arithmetic.
suppressMessages(library(car))
options(digits = 15)
cat("version", R.version.string, "car", as.character(packageVersion("car")), "\n")
out <- function(name, ...) { v <- list(...); cat(name, paste(names(v), unlist(v)), "\n") }

# --- two independent groups ---
tg <- read.csv("ToothGrowth.csv")
vc <- tg$len[tg$supp == "VC"]; oj <- tg$len[tg$supp == "OJ"]
w <- t.test(oj, vc, var.equal = FALSE); s <- t.test(oj, vc, var.equal = TRUE)
out("welch", t = w$statistic, df = w$parameter, p = w$p.value, lower = w$conf.int[1], upper = w$conf.int[2])
out("student", t = s$statistic, df = s$parameter, p = s$p.value, lower = s$conf.int[1], upper = s$conf.int[2])
lv <- car::leveneTest(len ~ factor(supp), data = tg, center = mean)
out("levene_mean", F = lv[1, "F value"], p = lv[1, "Pr(>F)"])
# Hedges' g and its CI: Cohen's d_s CI by inverting the noncentral t, both ends times J(df)
na <- length(oj); nb <- length(vc); df <- na + nb - 2
sp <- sqrt(((na - 1) * var(oj) + (nb - 1) * var(vc)) / df)
ds <- (mean(oj) - mean(vc)) / sp
J <- exp(lgamma(df / 2) - log(sqrt(df / 2)) - lgamma((df - 1) / 2))
tobs <- s$statistic
ncp_lo <- uniroot(function(d) suppressWarnings(pt(tobs, df, d)) - 0.975, c(-50, 50), tol = 1e-12)$root
ncp_hi <- uniroot(function(d) suppressWarnings(pt(tobs, df, d)) - 0.025, c(-50, 50), tol = 1e-12)$root
sc <- sqrt(1 / na + 1 / nb)
out("hedges", g = ds * J, lower = ncp_lo * sc * J, upper = ncp_hi * sc * J)
# Mann-Whitney: ties in ToothGrowth (normal approximation, tie and continuity corrections) ...
mw <- suppressWarnings(wilcox.test(oj, vc, exact = NULL, correct = TRUE))
out("mannwhitney_ties", W = mw$statistic, p = mw$p.value)
# ... and exact without ties (the example of ?wilcox.test)
x <- c(0.80, 0.83, 1.89, 1.04, 1.45, 1.38, 1.91, 1.64, 0.73, 1.46)
y <- c(1.15, 0.88, 0.90, 0.74, 1.21)
mx <- wilcox.test(x, y)
out("mannwhitney_exact", W = mx$statistic, p = mx$p.value)
# ANCOVA: supp adjusted for dose, dose numeric (common slope) ...
tg$g <- factor(tg$supp, levels = c("VC", "OJ"))
a0 <- lm(len ~ dose, data = tg); a1 <- lm(len ~ dose + g, data = tg); a2 <- lm(len ~ dose * g, data = tg)
av <- anova(a0, a1); sl <- anova(a1, a2); ci <- confint(a1)["gOJ", ]
out("ancova_numeric", diff = coef(a1)[["gOJ"]], lower = ci[1], upper = ci[2], F = av$F[2], df2 = av$Res.Df[2],
    p = av$`Pr(>F)`[2], slope = coef(a1)[["dose"]], slopesF = sl$F[2], slopesDf1 = sl$Df[2], slopesDf2 = sl$Res.Df[2],
    slopesP = sl$`Pr(>F)`[2], petasq = av$`Sum of Sq`[2] / (av$`Sum of Sq`[2] + av$RSS[2]))
# Type II check of the same test with car
a2t <- car::Anova(a1, type = 2)
out("ancova_numeric_car_typeII", F = a2t["g", "F value"], p = a2t["g", "Pr(>F)"])
# ... and dose as a factor (level as categorical)
tg$dosef <- factor(tg$dose)
f0 <- lm(len ~ dosef, data = tg); f1 <- lm(len ~ dosef + g, data = tg); f2 <- lm(len ~ dosef * g, data = tg)
fv <- anova(f0, f1); fs <- anova(f1, f2); fci <- confint(f1)["gOJ", ]
out("ancova_factor", diff = coef(f1)[["gOJ"]], lower = fci[1], upper = fci[2], F = fv$F[2], df2 = fv$Res.Df[2],
    p = fv$`Pr(>F)`[2], slopesF = fs$F[2], slopesDf1 = fs$Df[2], slopesDf2 = fs$Res.Df[2], slopesP = fs$`Pr(>F)`[2])

# --- three within-candidate conditions (tension L, M, H), wool between ---
wb <- read.csv("warpbreaks.csv")
wb$i <- ave(seq_along(wb$breaks), wb$wool, wb$tension, FUN = seq_along)
wide <- reshape(wb, idvar = c("wool", "i"), timevar = "tension", direction = "wide")
Y <- as.matrix(wide[, c("breaks.L", "breaks.M", "breaks.H")])
cat("matrix_rows_wool", as.character(wide$wool), "\n")
m1 <- lm(Y ~ 1)
mt <- mauchly.test(m1, X = ~1)
out("mauchly_rm", W = mt$statistic, p = mt$p.value)
sph <- anova(m1, X = ~1, test = "Spherical")
out("rm_spherical", GGp = sph[1, "G-G Pr"], HFp = sph[1, "H-F Pr"])
gg <- stats:::sphericity(SSD(m1), X = ~1, idata = data.frame(index = 1:3))
out("rm_epsilon", GG = gg$GG.eps, HF = gg$HF.eps)
long <- data.frame(y = as.vector(Y), cond = factor(rep(c("L", "M", "H"), each = nrow(Y))),
                   id = factor(rep(seq_len(nrow(Y)), 3)), wool = factor(rep(wide$wool, 3)))
rm <- summary(aov(y ~ cond + Error(id / cond), data = long))[["Error: id:cond"]][[1]]
out("rm_anova", F = rm["cond", "F value"], df1 = rm["cond", "Df"], df2 = rm["Residuals", "Df"], p = rm["cond", "Pr(>F)"],
    petasq = rm["cond", "Sum Sq"] / (rm["cond", "Sum Sq"] + rm["Residuals", "Sum Sq"]))
pw <- pairwise.t.test(long$y, long$cond, paired = TRUE, p.adjust.method = "holm")
out("rm_pairwise_holm", H_L = pw$p.value["L", "H"], M_H = pw$p.value["M", "H"], M_L = pw$p.value["M", "L"])
fr <- friedman.test(Y)
out("friedman", Q = fr$statistic, df = fr$parameter, p = fr$p.value)
# mixed: tension within, wool between
mx <- summary(aov(y ~ cond * wool + Error(id / cond), data = long))
b <- mx[["Error: id"]][[1]]; wi <- mx[["Error: id:cond"]][[1]]
rownames(b) <- trimws(rownames(b)); rownames(wi) <- trimws(rownames(wi))
out("mixed_between", F = b["wool", "F value"], df1 = b["wool", "Df"], df2 = b["Residuals", "Df"], p = b["wool", "Pr(>F)"])
out("mixed_condition", F = wi["cond", "F value"], p = wi["cond", "Pr(>F)"])
out("mixed_interaction", F = wi["cond:wool", "F value"], df1 = wi["cond:wool", "Df"], df2 = wi["Residuals", "Df"],
    p = wi["cond:wool", "Pr(>F)"])
m2 <- lm(Y ~ wool, data = wide)
mt2 <- mauchly.test(m2, X = ~1)
sph2 <- anova(m2, X = ~1, test = "Spherical")
out("mixed_sphericity", W = mt2$statistic, p = mt2$p.value, GGp_condition = sph2["(Intercept)", "G-G Pr"],
    HFp_condition = sph2["(Intercept)", "H-F Pr"], GGp_interaction = sph2["wool", "G-G Pr"],
    HFp_interaction = sph2["wool", "H-F Pr"])
