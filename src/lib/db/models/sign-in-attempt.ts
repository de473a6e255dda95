import { Model, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { integerColumn, textColumn } from './columns';

/** Failed password attempts within one throttle window, for one scope and subject (see src/lib/auth/throttle-rules.ts). */
export class SignInAttempt extends Model<InferAttributes<SignInAttempt>, InferCreationAttributes<SignInAttempt>> {
  declare key: string;
  declare scope: string;
  declare failures: number;
  declare windowStartedAt: number;
  declare lastFailureAt: number;
}

export function initSignInAttempt(sequelize: Sequelize): void {
  SignInAttempt.init(
    {
      key: { ...textColumn(), primaryKey: true },
      scope: textColumn(),
      failures: integerColumn(),
      windowStartedAt: integerColumn(),
      lastFailureAt: integerColumn(),
    },
    { sequelize, tableName: 'sign_in_attempts', modelName: 'SignInAttempt' },
  );
}
