@echo off
rem countercheck, as installed from the release archive: its own Java runtime and jar.
rem COUNTERCHECK_JAVA_OPTS adds or overrides JVM options. The heap is capped at 2 GB (20 000 elements fit).
setlocal
set "HERE=%~dp0"
set "JAVA=%HERE%..\runtime\bin\java.exe"
if not exist "%JAVA%" set "JAVA=java"
"%JAVA%" -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -Xmx2g %COUNTERCHECK_JAVA_OPTS% -jar "%HERE%..\lib\countercheck.jar" %*
exit /b %ERRORLEVEL%
