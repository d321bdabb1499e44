# Valijson is header-only. Debian's libvalijson-dev drags in Qt and Poco as
# package dependencies although the headers we use need neither, so
# tools/bootstrap unpacks the package's headers into .deps/valijson without its
# dependencies. A system install (/usr/include/valijson) is used when present.
find_path(Valijson_INCLUDE_DIR
  NAMES valijson/validator.hpp
  HINTS ${PROJECT_SOURCE_DIR}/.deps/valijson/usr/include
  PATHS /usr/include /usr/local/include)
include(FindPackageHandleStandardArgs)
find_package_handle_standard_args(Valijson REQUIRED_VARS Valijson_INCLUDE_DIR)
if(Valijson_FOUND AND NOT TARGET Valijson::Valijson)
  add_library(Valijson::Valijson INTERFACE IMPORTED)
  # SYSTEM: warnings inside third-party headers are not ours to fix.
  set_target_properties(Valijson::Valijson PROPERTIES INTERFACE_SYSTEM_INCLUDE_DIRECTORIES "${Valijson_INCLUDE_DIR}"
                                                      INTERFACE_INCLUDE_DIRECTORIES "${Valijson_INCLUDE_DIR}")
endif()
