@echo off
rem countercheck, as installed from the release archive: its own Java runtime and jar.
rem COUNTERCHECK_JAVA_OPTS adds or overrides JVM options.
setlocal
set "HERE=%~dp0"
set "JAVA=%HERE%..\runtime\bin\java.exe"
if not exist "%JAVA%" set "JAVA=java"
"%JAVA%" -XX:TieredStopAtLevel=1 -XX:+UseSerialGC -XX:MaxRAMPercentage=50 %COUNTERCHECK_JAVA_OPTS% -jar "%HERE%..\lib\countercheck.jar" %*
exit /b %ERRORLEVEL%
