/**
 * @file acperf/export.h
 * @brief Export and C++ linkage macros of the acperf public API.
 *
 * Every public symbol is declared with ACP_API; everything else in the
 * library is hidden (-fvisibility=hidden), so the exported ABI is exactly
 * what the headers declare.
 */
#ifndef ACPERF_EXPORT_H
#define ACPERF_EXPORT_H

#if defined(_WIN32) || defined(__CYGWIN__)
#  if defined(ACP_STATIC)
#    define ACP_API
#  elif defined(ACP_BUILDING_LIBRARY)
#    define ACP_API __declspec(dllexport)
#  else
#    define ACP_API __declspec(dllimport)
#  endif
#elif defined(__GNUC__) && __GNUC__ >= 4
#  define ACP_API __attribute__((visibility("default")))
#else
#  define ACP_API
#endif

#ifdef __cplusplus
#  define ACP_BEGIN_DECLS extern "C" {
#  define ACP_END_DECLS }
#else
#  define ACP_BEGIN_DECLS
#  define ACP_END_DECLS
#endif

#endif /* ACPERF_EXPORT_H */
