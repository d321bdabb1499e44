#include "engine/batch/sha256.h"

#include <openssl/evp.h>

#include <array>
#include <cassert>
#include <new>

namespace tenthpoint::batch {

struct Sha256::Context {
  EVP_MD_CTX* md = nullptr;
  ~Context() { EVP_MD_CTX_free(md); }
};

Sha256::Sha256() : context_(std::make_unique<Context>()) {
  context_->md = EVP_MD_CTX_new();
  // Allocation failure or a libcrypto without SHA-256 leaves nothing to hash
  // with; neither is an input problem.
  if (context_->md == nullptr || EVP_DigestInit_ex(context_->md, EVP_sha256(), nullptr) != 1) throw std::bad_alloc();
}

Sha256::Sha256(Sha256&&) noexcept = default;
Sha256& Sha256::operator=(Sha256&&) noexcept = default;
Sha256::~Sha256() = default;

Sha256& Sha256::update(std::string_view bytes) {
  assert(context_ && context_->md != nullptr);
  if (!bytes.empty() && EVP_DigestUpdate(context_->md, bytes.data(), bytes.size()) != 1) throw std::bad_alloc();
  return *this;
}

std::string Sha256::hex() {
  assert(context_ && context_->md != nullptr);
  std::array<unsigned char, EVP_MAX_MD_SIZE> digest{};
  unsigned int length = 0;
  if (EVP_DigestFinal_ex(context_->md, digest.data(), &length) != 1) throw std::bad_alloc();
  static constexpr char kDigits[] = "0123456789abcdef";
  std::string out;
  out.reserve(2 * length);
  for (unsigned int i = 0; i < length; ++i) {
    out += kDigits[digest[i] >> 4];
    out += kDigits[digest[i] & 0x0f];
  }
  return out;
}

std::string sha256_hex(std::string_view bytes) { return Sha256().update(bytes).hex(); }

}  // namespace tenthpoint::batch
