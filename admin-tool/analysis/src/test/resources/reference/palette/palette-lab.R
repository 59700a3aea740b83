# CIELAB (D65) of the report's series palette, by R's grDevices::convertColor (R from Debian:
# r-base-core), the outside reference for SeriesPaletteTest's colour distances.
# Run: Rscript palette-lab.R > palette-lab.csv
hex <- c("0A66C2", "C24E00", "007A5A", "A8388F", "8A6A00", "5A5A5A", "6B4FBB", "1F1F1F")
rgb <- t(sapply(hex, function(h) strtoi(c(substr(h, 1, 2), substr(h, 3, 4), substr(h, 5, 6)), 16L))) / 255
lab <- convertColor(rgb, from = "sRGB", to = "Lab", to.ref.white = "D65")
out <- data.frame(hex = hex, L = lab[, 1], a = lab[, 2], b = lab[, 3])
write.csv(out, stdout(), row.names = FALSE, quote = FALSE)
