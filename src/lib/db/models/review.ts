import { Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import { booleanColumn, createdAtColumn, idColumn, textColumn } from './columns';

export type ReviewDecision = 'returned' | 'countersigned';
export type ReviewPart = 'scheme' | 'channel' | 'flows' | 'structure' | 'limits' | 'results';

export class Review extends Model<InferAttributes<Review>, InferCreationAttributes<Review>> {
  declare id: string;
  declare revisionId: string;
  declare checkerId: string;
  declare decision: ReviewDecision | null;
  declare summary: string | null;
  declare rerunMatches: boolean | null;
  declare rerunResultsSha256: string | null;
  declare decidedAt: string | null;
  declare createdAt: CreationOptional<string>;
}

export class ReviewComment extends Model<InferAttributes<ReviewComment>, InferCreationAttributes<ReviewComment>> {
  declare id: string;
  declare reviewId: string;
  declare authorId: string;
  declare part: ReviewPart;
  declare body: string;
  declare createdAt: CreationOptional<string>;
}

export function initReview(sequelize: Sequelize): void {
  Review.init(
    {
      id: idColumn(),
      revisionId: textColumn(),
      checkerId: textColumn(),
      decision: textColumn(true),
      summary: textColumn(true),
      rerunMatches: { ...booleanColumn(), allowNull: true, defaultValue: null },
      rerunResultsSha256: textColumn(true),
      decidedAt: textColumn(true),
      createdAt: createdAtColumn(),
    },
    { sequelize, tableName: 'reviews', modelName: 'Review' },
  );
  ReviewComment.init(
    { id: idColumn(), reviewId: textColumn(), authorId: textColumn(), part: textColumn(), body: textColumn(), createdAt: createdAtColumn() },
    { sequelize, tableName: 'review_comments', modelName: 'ReviewComment' },
  );
}
