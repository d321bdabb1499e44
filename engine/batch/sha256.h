// Sha256: the SHA-256 digest (FIPS 180-4) of a byte stream, as lower-case
// hex. It fingerprints the inputs of a rating so that the nightly run can tell
// an unchanged bridge without reading it. Backed by OpenSSL's libcrypto (EVP),
// which stays inside this file pair.
#pragma once

#include <memory>
#include <string>
#include <string_view>

namespace tenthpoint::batch {

class Sha256 {
 public:
  Sha256();
  Sha256(Sha256&&) noexcept;
  Sha256& operator=(Sha256&&) noexcept;
  ~Sha256();

  // Feeds more bytes; may be called any number of times before hex().
  Sha256& update(std::string_view bytes);
  // The digest of everything fed so far, 64 lower-case hex digits. Ends the
  // stream: update() must not be called afterwards.
  [[nodiscard]] std::string hex();

 private:
  struct Context;
  std::unique_ptr<Context> context_;
};

// The digest of `bytes` in one call.
[[nodiscard]] std::string sha256_hex(std::string_view bytes);

}  // namespace tenthpoint::batch
