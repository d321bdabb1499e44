# Helpers that keep every engine module's CMake mechanical.
#
#   tenthpoint_module(NAME name SOURCES ... [DEPS ...])
# defines the static library tenthpoint_<name> with alias tenthpoint::<name>.
# DEPS are public; the dependency direction of the pipeline is enforced by
# listing only modules to the left (core <- model <- io ...).

function(tenthpoint_warnings target)
  if(CMAKE_CXX_COMPILER_ID MATCHES "GNU|Clang")
    target_compile_options(${target} PRIVATE -Wall -Wextra -Wpedantic -Wshadow -Wconversion -Wno-sign-conversion)
    if(TENTHPOINT_WERROR)
      target_compile_options(${target} PRIVATE -Werror)
    endif()
  endif()
  if(TENTHPOINT_SANITIZE)
    target_compile_options(${target} PRIVATE -fsanitize=address,undefined -fno-omit-frame-pointer -fno-sanitize-recover=undefined)
    target_link_options(${target} PUBLIC -fsanitize=address,undefined)
  endif()
endfunction()

function(tenthpoint_module)
  cmake_parse_arguments(ARG "" "NAME" "SOURCES;DEPS;PRIVATE_DEPS" ${ARGN})
  set(target tenthpoint_${ARG_NAME})
  add_library(${target} STATIC ${ARG_SOURCES})
  add_library(tenthpoint::${ARG_NAME} ALIAS ${target})
  target_include_directories(${target} PUBLIC ${PROJECT_SOURCE_DIR} ${PROJECT_BINARY_DIR}/generated)
  target_link_libraries(${target} PUBLIC ${ARG_DEPS} PRIVATE ${ARG_PRIVATE_DEPS})
  tenthpoint_warnings(${target})
endfunction()
