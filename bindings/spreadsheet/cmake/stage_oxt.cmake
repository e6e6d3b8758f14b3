# cmake -P: put the SWIG module and libacperf into the extension's pythonpath and
# make the module find the library beside itself ($ORIGIN), then zip the .oxt.
# -D STAGE= CAPI_PY= CAPI_SO= LIB= LIB_SONAME= SRC= OXT=
set(pkg ${STAGE}/pythonpath/acperf_sheet)
file(REMOVE_RECURSE ${STAGE}/pythonpath)
file(MAKE_DIRECTORY ${pkg}/lib)
file(COPY ${SRC}/calc/acperf_calc.py DESTINATION ${STAGE})
file(COPY ${SRC}/calc/acperf_sheet/__init__.py ${SRC}/calc/acperf_sheet/engine.py
          ${SRC}/functions.py DESTINATION ${pkg})
file(WRITE ${pkg}/lib/__init__.py "# libacperf and its SWIG module, shipped with the extension\n")
file(COPY ${CAPI_PY} DESTINATION ${pkg}/lib)
get_filename_component(so_name ${CAPI_SO} NAME)
configure_file(${CAPI_SO} ${pkg}/lib/${so_name} COPYONLY)
configure_file(${LIB} ${pkg}/lib/${LIB_SONAME} COPYONLY)
# The build tree's RUNPATH names the build directory; the shipped one its own folder.
file(RPATH_SET FILE ${pkg}/lib/${so_name} NEW_RPATH "$ORIGIN")
file(REMOVE ${OXT})
file(GLOB_RECURSE files RELATIVE ${STAGE} ${STAGE}/*)
list(FILTER files EXCLUDE REGEX "(__pycache__|\\.idl$)")
execute_process(COMMAND ${CMAKE_COMMAND} -E tar cf ${OXT} --format=zip ${files}
                WORKING_DIRECTORY ${STAGE} RESULT_VARIABLE rc)
if(rc)
  message(FATAL_ERROR "zip of ${OXT} failed")
endif()
