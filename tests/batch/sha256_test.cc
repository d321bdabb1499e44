#include "engine/batch/sha256.h"

#include <string>

#include <catch2/catch.hpp>

using tenthpoint::batch::Sha256;
using tenthpoint::batch::sha256_hex;

TEST_CASE("SHA-256 of the FIPS 180-4 example messages matches the published digests", "[batch][sha256]") {
  // NIST FIPS 180-4 examples (csrc.nist.gov "SHA256.pdf" example values):
  // "abc", the 448-bit two-block message, and the empty string.
  CHECK(sha256_hex("abc") == "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  CHECK(sha256_hex("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq") ==
        "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
  CHECK(sha256_hex("") == "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
}

TEST_CASE("feeding SHA-256 in pieces gives the digest of the whole", "[batch][sha256]") {
  // Same NIST "abc" value as above, fed one byte at a time; and the one
  // million 'a' message of the NIST examples.
  CHECK(Sha256().update("a").update("b").update("c").hex() ==
        "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  Sha256 million;
  const std::string thousand(1000, 'a');
  for (int i = 0; i < 1000; ++i) million.update(thousand);
  CHECK(million.hex() == "cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0");
}
