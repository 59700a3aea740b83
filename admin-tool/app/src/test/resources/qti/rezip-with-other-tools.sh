#!/bin/sh
# Re-zips an unpacked QTI package the way other programs write ZIPs, for QtiForeignZipImportTest.
# Usage: rezip-with-other-tools.sh PACKAGE_FOLDER OUT_FOLDER   (OUT_FOLDER an absolute path)
# Each tool is used only when it is installed; the test knows which files to expect.
set -eu
src=$1
out=$2
cd "$src"

if command -v zip >/dev/null 2>&1; then
  # Info-ZIP zip 3.0 (Debian package zip): directory entries, extended-timestamp (UT) and Unix
  # uid/gid (ux) extra fields, real dates, then an archive comment
  zip -q -r "$out/info-zip.zip" .
  echo "an invented archive comment" | zip -q -z "$out/info-zip.zip"
  # written to a pipe, Info-ZIP cannot seek back and adds data descriptors (general-purpose bit 3)
  zip -q -r - . | cat > "$out/info-zip-streamed.zip"
fi

if command -v python3 >/dev/null 2>&1; then
  # Python's zipfile, writing to a stream it cannot seek (so with data descriptors), with
  # directory entries and an archive comment
  python3 - "$out/python-zipfile.zip" <<'PY'
import io, os, sys, zipfile

class Unseekable(io.RawIOBase):
    def __init__(self, target):
        self.target = target
    def writable(self):
        return True
    def write(self, data):
        return self.target.write(data)

with open(sys.argv[1], "wb") as target:
    with zipfile.ZipFile(Unseekable(target), "w", zipfile.ZIP_DEFLATED) as z:
        for folder, dirs, files in sorted(os.walk(".")):
            dirs.sort()
            rel = os.path.relpath(folder, ".")
            if rel != ".":
                z.writestr(zipfile.ZipInfo(rel.replace(os.sep, "/") + "/"), b"")
            for name in sorted(files):
                path = os.path.join(folder, name)
                z.write(path, os.path.relpath(path, ".").replace(os.sep, "/"))
        z.comment = b"an invented archive comment"
PY
fi
