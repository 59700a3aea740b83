#!/bin/sh
# Produces openssl-pbes2-rfc8410.pem: the RFC 8410 section 10.3 example Ed25519 key, encrypted by
# OpenSSL (a general-purpose reference implementation) as PKCS#8 EncryptedPrivateKeyInfo with
# PBES2 (PBKDF2-HMAC-SHA256, AES-256-CBC). EncryptedKeysTest checks that our reader opens it.
# Run here with OpenSSL 3.x; the output differs each run (random salt and IV), any run will do.
set -e
openssl pkcs8 -topk8 -in rfc8410-section-10.3-private.pem -v2 aes-256-cbc -v2prf hmacWithSHA256 \
  -iter 100000 -passout pass:'correct horse battery' -out openssl-pbes2-rfc8410.pem
openssl asn1parse -in openssl-pbes2-rfc8410.pem | head -20
