/** Version of the calculation engine, recorded with every result so that a certificate can be reproduced. 0.3.0: reservoir routing (every event result carries `routing`). */
export const ENGINE_VERSION = '0.3.0';
