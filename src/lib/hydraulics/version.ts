/** Version of the calculation engine, recorded with every result so that a certificate can be reproduced. */
export const ENGINE_VERSION = '0.2.0';
