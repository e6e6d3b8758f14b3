/* Modules covered by the reliability contract: one line each, in call order.
   CONTRACT_MODULE: the foundation modules (no model; fuzz_numeric);
   CONTRACT_MODEL: the modules computing on an aircraft model or a mission,
   driven on the demo aircraft and fuzzed private copies (fuzz_models).
   The thread test runs both. tests/reliability/coverage.sh requires every
   function declared in libperf/include/acperf/<module>.h to appear in
   contract_<module>.c and in the domain audit (tests/c/test_domain*.c). */
CONTRACT_MODULE(status)
CONTRACT_MODULE(units)
CONTRACT_MODULE(atmosphere)
CONTRACT_MODULE(airspeed)
CONTRACT_MODULE(friction)
CONTRACT_MODEL(aircraft)
CONTRACT_MODEL(polar)
CONTRACT_MODEL(schedule)
CONTRACT_MODEL(propulsion)
CONTRACT_MODEL(speeds)
CONTRACT_MODEL(climb)
CONTRACT_MODEL(cruise)
CONTRACT_MODEL(mission)
